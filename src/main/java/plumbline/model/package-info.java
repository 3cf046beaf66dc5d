/**
 * The model and the claims as immutable records in SI units (N, m, Pa, rad, K), with the input
 * problems found while reading them ({@link plumbline.model.Problem}, {@link
 * plumbline.model.InputException}) and the claimed quantities as a type ({@link
 * plumbline.model.Quantity}). Uses {@code units} only.
 */
package plumbline.model;
