package plumbline.statics;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import plumbline.model.Member;
import plumbline.model.Model;
import plumbline.model.Node;
import plumbline.model.Support;

/**
 * The equilibrium matrix A of a plane model: one row per node equation (sum of forces in x,
 * in y, and of moments, the moment row only where the node has rotational stiffness), one
 * column per independent force: per member its axial force N (tension, at the start) and
 * the end moments it can carry (m_i, m_j, counter-clockwise on the member; none at a
 * released end), and per support one column per restrained or sprung direction. A column
 * holds the forces its unit value puts on the nodes, so that A s = -P for node loads P.
 *
 * <p>With end moments m_i, m_j the member's end shears are (m_i + m_j)/L on the start
 * (local +y) and the opposite on the end; the member pushes on its nodes with the
 * opposite of the forces on its ends.
 */
public final class EquilibriumMatrix {

    /** What an unknown is. */
    public enum Kind { AXIAL, MOMENT_START, MOMENT_END, REACTION }

    /** The endings of the labels of the unknowns that are moments: a member's end moments and a support's moment. */
    private static final String[] MOMENT_LABELS = {".M_start", ".M_end", ".Mz"};

    /**
     * True when an unknown's label names a moment (its unit is a force times a length, and the
     * displacement it works through a rotation), as the force method's working lists it.
     */
    public static boolean isMoment(String label) {
        for (String end : MOMENT_LABELS) if (label.endsWith(end)) return true;
        return false;
    }

    /** One unknown: its kind, the member or node it belongs to, and for a reaction the direction (0 ux, 1 uy, 2 rz). */
    public record Unknown(Kind kind, String owner, int direction, String label) {
    }

    /** One equation: node and direction (0 Fx, 1 Fy, 2 Mz). */
    public record Equation(String node, int direction) {
    }

    private final List<Equation> equations;
    private final List<Unknown> unknowns;
    /** Column storage: a column has at most six non-zeros (a member's two nodes), a reaction one or two. */
    private final int[][] rows;
    private final double[][] values;
    private final double lengthScale;

    private EquilibriumMatrix(List<Equation> eqs, List<Unknown> unk, int[][] rows, double[][] values, double lengthScale) {
        this.equations = List.copyOf(eqs);
        this.unknowns = List.copyOf(unk);
        this.rows = rows;
        this.values = values;
        this.lengthScale = lengthScale;
    }

    public List<Equation> equations() {
        return equations;
    }

    public List<Unknown> unknowns() {
        return unknowns;
    }

    /** Entry (row, column) in SI (N per N, or N per N*m, or N*m per N). */
    public double get(int row, int col) {
        int[] r = rows[col];
        for (int k = 0; k < r.length; k++) if (r[k] == row) return values[col][k];
        return 0.0;
    }

    /** Row indices of the non-zeros of column {@code col}. */
    public int[] columnRows(int col) {
        return rows[col].clone();
    }

    /** Values of the non-zeros of column {@code col}, in the order of {@link #columnRows(int)}. */
    public double[] columnValues(int col) {
        return values[col].clone();
    }

    /** The characteristic length (m) used to make moment rows and columns commensurate with forces. */
    public double lengthScale() {
        return lengthScale;
    }

    public static EquilibriumMatrix of(Model model) {
        Set<String> rotation = model.rotationalNodes();
        List<Equation> eqs = new ArrayList<>();
        Map<String, Integer> row = new HashMap<>();
        for (Node n : model.nodes().values()) {
            row.put(n.name(), eqs.size());
            eqs.add(new Equation(n.name(), 0));
            eqs.add(new Equation(n.name(), 1));
            if (rotation.contains(n.name())) eqs.add(new Equation(n.name(), 2));
        }
        List<Unknown> unk = new ArrayList<>();
        for (Member m : model.members().values()) {
            unk.add(new Unknown(Kind.AXIAL, m.name(), -1, m.name() + ".N"));
            if (!m.releasedStart()) unk.add(new Unknown(Kind.MOMENT_START, m.name(), -1, m.name() + MOMENT_LABELS[0]));
            if (!m.releasedEnd()) unk.add(new Unknown(Kind.MOMENT_END, m.name(), -1, m.name() + MOMENT_LABELS[1]));
        }
        String[] dirs = {"Fx", "Fy", MOMENT_LABELS[2].substring(1)};
        for (Support s : model.supports().values()) {
            for (int d = 0; d < 3; d++) if (s.reacts(d)) unk.add(new Unknown(Kind.REACTION, s.node(), d, s.node() + "." + dirs[d]));
        }
        int[][] rowsOf = new int[unk.size()][];
        double[][] valuesOf = new double[unk.size()][];
        for (int c = 0; c < unk.size(); c++) {
            Unknown u = unk.get(c);
            TreeMap<Integer, Double> a = new TreeMap<>();
            if (u.kind() == Kind.REACTION) {
                Support s = model.supports().get(u.owner());
                int r = row.get(u.owner());
                double cs = Math.cos(s.angleRad()), sn = Math.sin(s.angleRad());
                if (u.direction() == 0) {
                    a.merge(r, cs, Double::sum);
                    a.merge(r + 1, sn, Double::sum);
                } else if (u.direction() == 1) {
                    a.merge(r, -sn, Double::sum);
                    a.merge(r + 1, cs, Double::sum);
                } else {
                    a.merge(r + 2, 1.0, Double::sum);
                }
            } else {
                Member m = model.member(u.owner());
                put(a, row, rotation, model, m, unitEndForces(model, m, u.kind()));
            }
            a.values().removeIf(v -> v == 0.0);
            rowsOf[c] = a.keySet().stream().mapToInt(Integer::intValue).toArray();
            valuesOf[c] = a.values().stream().mapToDouble(Double::doubleValue).toArray();
        }
        return new EquilibriumMatrix(eqs, unk, rowsOf, valuesOf, model.extentM());
    }

    /**
     * Local end forces on the member {fx_i, fy_i, m_i, fx_j, fy_j, m_j} for a unit value of
     * one of its independent forces, with no load on it.
     */
    public static double[] unitEndForces(Model model, Member m, Kind kind) {
        double len = model.lengthM(m);
        return switch (kind) {
            case AXIAL -> new double[]{-1, 0, 0, 1, 0, 0};
            case MOMENT_START -> new double[]{0, 1 / len, 1, 0, -1 / len, 0};
            case MOMENT_END -> new double[]{0, 1 / len, 0, 0, -1 / len, 1};
            default -> throw new IllegalArgumentException(kind.toString());
        };
    }

    /** Adds to a column the forces on the nodes of m from member end forces f (local). */
    private static void put(Map<Integer, Double> a, Map<String, Integer> row, Set<String> rotation,
                            Model model, Member m, double[] f) {
        Node ni = model.node(m.from()), nj = model.node(m.to());
        double len = model.lengthM(m);
        double cx = (nj.xM() - ni.xM()) / len, cy = (nj.yM() - ni.yM()) / len;
        int ri = row.get(m.from()), rj = row.get(m.to());
        a.merge(ri, -(f[0] * cx - f[1] * cy), Double::sum);
        a.merge(ri + 1, -(f[0] * cy + f[1] * cx), Double::sum);
        if (rotation.contains(m.from())) a.merge(ri + 2, -f[2], Double::sum);
        a.merge(rj, -(f[3] * cx - f[4] * cy), Double::sum);
        a.merge(rj + 1, -(f[3] * cy + f[4] * cx), Double::sum);
        if (rotation.contains(m.to())) a.merge(rj + 2, -f[5], Double::sum);
    }

}
