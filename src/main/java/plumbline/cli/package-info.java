/**
 * The picocli commands and the run that ties reading, checking, solving, review and writing
 * together; the only place that exits, and with which code (format reference section 5). Uses
 * every other package.
 */
package plumbline.cli;
