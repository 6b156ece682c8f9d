/** Elliptic Gaussian beams over in-plane anisotropic layers. Implementation only: nothing exported. */
package lamella.geometry.elliptic;
