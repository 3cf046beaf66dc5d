/**
 * Generators of large synthetic models for the benchmarks (invented data, for measurement
 * only). Uses nothing of the project: it writes model text.
 */
package plumbline.bench;
