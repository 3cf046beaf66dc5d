/**
 * The force (flexibility) method on the equilibrium matrix: the dense method with chosen or
 * automatic redundants and its working ({@code ForceEngine}), the sparse method with closed-ring
 * self-stress states for large models ({@code SparseForceMethod}), and the force method's
 * own closed-form member terms ({@code ClosedFormMember}). Uses {@code model}, {@code linalg},
 * {@code statics}, Commons Math and the shared classes of {@code solve} that
 * {@code ArchitectureTest} lists; nothing of {@code solve.stiffness}.
 */
package plumbline.solve.force;
