/**
 * Physical dimensions, unit symbols with their SI factors (NIST SP 811) and the parser of
 * quantities such as "12.5 kN/m". Uses nothing of the project; everything else may use it.
 */
package plumbline.units;
