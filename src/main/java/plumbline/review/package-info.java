/**
 * The review of a run: load sets (user and standard combinations, pattern parts), the analysis
 * driver, engine agreement, the tolerance policy, the comparison of every claim, the diagnosis
 * of discrepancies, the verdict, and the choice of load sets to draw. Uses {@code units},
 * {@code model}, {@code validate}, {@code statics} and {@code solve}.
 */
package plumbline.review;
