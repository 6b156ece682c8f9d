/** A long strip heater of finite width. Implementation only: nothing exported. */
package lamella.geometry.line;
