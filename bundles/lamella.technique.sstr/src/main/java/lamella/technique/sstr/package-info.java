/** Steady-state thermoreflectance. Implementation only: nothing exported. */
package lamella.technique.sstr;
