/** Least-squares fitting, sensitivity and uncertainty propagation. Implementation only: used through FitService. */
package lamella.fit;
