package plumbline.bench;

import java.util.Locale;

/**
 * Synthetic models for benchmarks, written as model files so the whole pipeline (reading
 * included) is measured: a multi-bay multi-storey rigid frame with fixed bases, three load
 * cases (dead on the beams with self-weight, live on the beams, wind at every floor) and
 * ten combinations; a long Pratt truss; a long continuous beam. Invented data for
 * measurement only.
 */
public final class FrameGenerator {

    private FrameGenerator() {
    }

    private static String head() {
        return """
                format: plumbline/1
                job: {title: Synthetic benchmark model}
                units: {force: kN, length: m}
                materials: {steel: {E: 210 GPa, density: 78.5 kN/m3}}
                sections:
                  COL: {A: 0.012, I: 2.5e-4, depth: 0.35, material: steel}
                  BEAM: {A: 0.008, I: 3.0e-4, depth: 0.5, material: steel}
                """;
    }

    /** A frame of {@code bays} x {@code storeys}: (bays+1) x storeys columns and bays x storeys beams. */
    public static String frame(int bays, int storeys) {
        StringBuilder sb = new StringBuilder(head());
        sb.append("nodes:\n");
        for (int j = 0; j <= storeys; j++) {
            for (int i = 0; i <= bays; i++) {
                sb.append(String.format(Locale.ROOT, "  N%d_%d: [%.3f, %.3f]%n", i, j, 6.0 * i, 3.5 * j));
            }
        }
        sb.append("supports:\n");
        for (int i = 0; i <= bays; i++) sb.append("  N").append(i).append("_0: fixed\n");
        sb.append("members:\n");
        StringBuilder beams = new StringBuilder();
        for (int j = 1; j <= storeys; j++) {
            for (int i = 0; i <= bays; i++) {
                sb.append("  C").append(i).append('_').append(j).append(": {from: N").append(i).append('_').append(j - 1)
                        .append(", to: N").append(i).append('_').append(j).append(", section: COL}\n");
            }
            for (int i = 0; i < bays; i++) {
                String b = "B" + i + "_" + j;
                sb.append("  ").append(b).append(": {from: N").append(i).append('_').append(j).append(", to: N").append(i + 1)
                        .append('_').append(j).append(", section: BEAM}\n");
                if (beams.length() > 0) beams.append(", ");
                beams.append(b);
            }
        }
        sb.append("loads:\n");
        sb.append("  D: {type: dead, self_weight: true, member_loads: [{members: [").append(beams).append("], w: -12}]}\n");
        sb.append("  L: {type: live, member_loads: [{members: [").append(beams).append("], w: -9}]}\n");
        sb.append("  W:\n    type: wind\n    node_loads:\n");
        for (int j = 1; j <= storeys; j++) sb.append("      - {node: N0_").append(j).append(", Fx: 15}\n");
        sb.append("combinations:\n");
        double[][] f = {{1.35, 1.5, 0}, {1.35, 0, 1.5}, {1.35, 1.05, 1.5}, {1.35, 1.5, 0.9}, {1.0, 0, 1.5},
                {1.0, 1.5, 0}, {1.2, 1.6, 0}, {1.2, 1.0, 1.6}, {0.9, 0, 1.6}, {1.0, 1.0, 0}};
        for (int k = 0; k < f.length; k++) {
            sb.append(String.format(Locale.ROOT, "  C%02d: {D: %.2f, L: %.2f, W: %.2f}%n", k + 1, f[k][0], f[k][1], f[k][2]));
        }
        return sb.toString();
    }

    /** Members in {@link #frame(int, int)}. */
    public static int frameMembers(int bays, int storeys) {
        return (bays + 1) * storeys + bays * storeys;
    }
}
