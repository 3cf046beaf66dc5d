/**
 * Checks of a read model that need it whole: geometry and connectivity ({@code
 * StructureCheck}), claim references ({@code ClaimCheck}) and the plausibility lint ({@code
 * Plausibility}, warnings only). Uses {@code model} only.
 */
package plumbline.validate;
