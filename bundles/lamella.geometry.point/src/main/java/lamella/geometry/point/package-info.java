/** A point heat source sensed at a distance. Implementation only: nothing exported. */
package lamella.geometry.point;
