/**
 * One run of {@code check} or {@code solve}, made in memory from the input files' names and
 * bytes: read and validate, analyse by both methods, review, and every output's bytes. The
 * command line writes what it makes to files; the workbench serves the same bytes, so a
 * report downloaded from the browser is the one {@code check} writes. Uses report, review,
 * solve, statics, validate, io, model, units.
 */
package plumbline.run;
