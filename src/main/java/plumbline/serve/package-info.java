/**
 * The workbench: {@code plumbline serve}, a page in the checker's own browser to type the
 * model, see it drawn, paste the claims and run the check. Built on the JDK's HTTP server;
 * the page's code ships inside the jar. Safe by default: loopback only, its own Host and
 * Origin only, a random key guarding the API, limited request sizes, files only inside the
 * folder it was started in. Uses run, report, review, solve, statics, validate, io, model,
 * units.
 */
package plumbline.serve;
