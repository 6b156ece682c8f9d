/** An example geometry plug-in: a heater strip and a sensor strip. Implementation only: nothing exported. */
package lab.example.linepair;
