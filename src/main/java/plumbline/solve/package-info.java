/**
 * What the two methods share and what checks them: the {@code Engine} contract and its result
 * types, local member actions ({@code MemberActions}), exact piecewise-polynomial member
 * functions and their peaks, pattern envelopes, superposition, the equilibrium check of every
 * solution ({@code Equilibrium}) and the seams ({@code MemberLoading},
 * {@code MemberFunctions}) through which tests plant slips. Uses {@code model} and
 * {@code statics} (load resultants for the equilibrium check).
 */
package plumbline.solve;
