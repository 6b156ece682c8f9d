/** The 3ω line-heater method. Implementation only: nothing exported. */
package lamella.technique.threeomega;
