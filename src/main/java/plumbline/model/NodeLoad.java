package plumbline.model;

/** Force (N, global axes) and couple (N*m, counter-clockwise) applied at a node. */
public record NodeLoad(String node, double fxN, double fyN, double mzNm, SourceRef at) {
}
