/** Gaussian pump and probe beams, co-axial or offset. Implementation only: nothing exported. */
package lamella.geometry.gaussian;
