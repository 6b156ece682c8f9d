/** The JSON case format, version 1. Implementation only: used through the CaseFormat service. */
package lamella.casefile;
