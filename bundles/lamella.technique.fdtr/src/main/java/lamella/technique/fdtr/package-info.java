/** Frequency-domain thermoreflectance. Implementation only: nothing exported. */
package lamella.technique.fdtr;
