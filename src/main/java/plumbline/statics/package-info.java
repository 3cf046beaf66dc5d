/**
 * Statics of the model, independent of both solving methods: the equilibrium matrix,
 * determinacy and stability by rank, mechanism words, applied-load resultants straight from
 * the model's load records ({@code AppliedLoads}) and the equilibrium of claimed reactions.
 * Uses {@code model}, {@code linalg} and Commons Math; nothing of {@code solve}.
 */
package plumbline.statics;
