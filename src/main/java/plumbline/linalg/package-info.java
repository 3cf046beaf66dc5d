/**
 * General sparse numerics with no structural knowledge: the skyline L D L^T factorization
 * (definite and semi-definite) and reverse Cuthill-McKee ordering. Uses nothing of the project
 * but the JDK.
 */
package plumbline.linalg;
