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

    /** A Pratt truss of {@code panels} panels (about 5 members per panel), pinned and on a roller, loaded at every bottom node. */
    public static String truss(int panels) {
        StringBuilder sb = new StringBuilder(head());
        sb.append("nodes:\n");
        for (int i = 0; i <= panels; i++) sb.append(String.format(Locale.ROOT, "  L%d: [%.3f, 0]%n", i, 3.0 * i));
        for (int i = 1; i < panels; i++) sb.append(String.format(Locale.ROOT, "  U%d: [%.3f, 2.5]%n", i, 3.0 * i));
        sb.append("supports:\n  L0: pinned\n  L").append(panels).append(": roller\n");
        sb.append("members:\n");
        for (int i = 0; i < panels; i++) sb.append("  B").append(i).append(": {from: L").append(i).append(", to: L").append(i + 1).append(", section: COL, truss: true}\n");
        for (int i = 1; i < panels - 1; i++) sb.append("  T").append(i).append(": {from: U").append(i).append(", to: U").append(i + 1).append(", section: COL, truss: true}\n");
        sb.append("  E0: {from: L0, to: U1, section: BEAM, truss: true}\n");
        sb.append("  E1: {from: U").append(panels - 1).append(", to: L").append(panels).append(", section: BEAM, truss: true}\n");
        for (int i = 1; i < panels; i++) sb.append("  V").append(i).append(": {from: L").append(i).append(", to: U").append(i).append(", section: BEAM, truss: true}\n");
        for (int i = 1; i < panels - 1; i++) {
            boolean left = i < panels / 2;
            sb.append("  D").append(i).append(": {from: ").append(left ? "U" + i : "L" + i).append(", to: ").append(left ? "L" + (i + 1) : "U" + (i + 1)).append(", section: BEAM, truss: true}\n");
        }
        sb.append("loads:\n  D:\n    type: dead\n    node_loads:\n");
        for (int i = 1; i < panels; i++) sb.append("      - {node: L").append(i).append(", Fy: -20}\n");
        sb.append("  L:\n    type: live\n    node_loads:\n");
        for (int i = 1; i < panels; i++) sb.append("      - {node: L").append(i).append(", Fy: -15}\n");
        sb.append("  W:\n    type: wind\n    node_loads:\n      - {node: U1, Fx: 10}\n");
        sb.append("combinations:\n  C1: {D: 1.35, L: 1.5}\n  C2: {D: 1.0, W: 1.5}\n");
        return sb.toString();
    }

    /** A continuous beam of {@code spans} equal spans on pinned and roller supports. */
    public static String beam(int spans) {
        StringBuilder sb = new StringBuilder(head());
        sb.append("nodes:\n");
        for (int i = 0; i <= spans; i++) sb.append(String.format(Locale.ROOT, "  N%d: [%.3f, 0]%n", i, 5.0 * i));
        sb.append("supports:\n  N0: pinned\n");
        for (int i = 1; i <= spans; i++) sb.append("  N").append(i).append(": roller\n");
        sb.append("members:\n");
        StringBuilder all = new StringBuilder();
        for (int i = 0; i < spans; i++) {
            sb.append("  S").append(i).append(": {from: N").append(i).append(", to: N").append(i + 1).append(", section: BEAM}\n");
            if (i > 0) all.append(", ");
            all.append("S").append(i);
        }
        sb.append("loads:\n  D: {type: dead, self_weight: true, member_loads: [{members: [").append(all).append("], w: -10}]}\n");
        sb.append("  L: {type: live, member_loads: [{members: [").append(all).append("], w: -8}]}\n");
        sb.append("combinations:\n  C1: {D: 1.35, L: 1.5}\n  C2: {D: 1.0, L: 1.0}\n");
        return sb.toString();
    }
}
