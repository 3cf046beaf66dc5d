package plumbline.model;

/** Temperature change of a member: uniform (K) and gradient = top (local +y) minus bottom (K). */
public record Temperature(String member, double uniformK, double gradientK, SourceRef at) {
}
