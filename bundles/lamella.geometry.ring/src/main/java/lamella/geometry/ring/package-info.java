/** Heat on a ring, sensed at its centre. Implementation only: nothing exported. */
package lamella.geometry.ring;
