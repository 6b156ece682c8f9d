/** Time-domain thermoreflectance. Implementation only: nothing exported. */
package lamella.technique.tdtr;
