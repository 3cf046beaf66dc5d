/**
 * The direct stiffness (displacement) method: element stiffness, fixed-end forces by Gauss
 * quadrature, skyline factorization once and one back-substitution per load case. Uses
 * {@code model}, {@code linalg} and the shared classes of {@code solve} that
 * {@code ArchitectureTest} lists; nothing of {@code solve.force}.
 */
package plumbline.solve.stiffness;
