/**
 * Reading model and claims files (YAML, JSON, CSV) into the {@code model} records, with every
 * problem located by file, line, column and field; writing output files so that a failed run
 * leaves nothing half-written. The only package that imports Jackson. One reader per section
 * of the format: {@code ModelReader} (the file, units, job), {@code PropertiesReader},
 * {@code GeometryReader}, {@code LoadsReader}, {@code CombinationsReader},
 * {@code ClaimsReader}. Uses {@code units} and {@code model}.
 */
package plumbline.io;
