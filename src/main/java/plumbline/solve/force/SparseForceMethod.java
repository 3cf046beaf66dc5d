package plumbline.solve.force;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.Comparator;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.IntStream;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.SingularValueDecomposition;
import plumbline.linalg.NodeOrdering;
import plumbline.linalg.SkylineLdl;
import plumbline.linalg.SkylineMatrix;
import plumbline.model.LoadCase;
import plumbline.model.Model;
import plumbline.solve.EngineResult;
import plumbline.solve.MemberActions;
import plumbline.solve.Solution;
import plumbline.statics.EquilibriumMatrix;
import plumbline.statics.ScaledEquilibrium;

/**
 * The force method for large models, kept sparse by choosing local self-stress states: the
 * closed rings of the structure, read as the bounded faces of its plane drawing with the
 * ground as one more vertex (a ring through the ground runs between two supports). Each
 * ring's own equilibrium equations give its self-stress states (the null space of a small
 * matrix), which involve only the ring's members and reactions. The compatibility
 * equations (X^T F X) z = -X^T (F x0 + e - d) are then sparse and banded and are solved by
 * a skyline L D L^T; the particular solution x0 and the node displacements (from the
 * compatible deformations, A^T u = -(F x + e - d), the virtual-work statement for A x = -p) come from the normal equations A A^T of the
 * equilibrium matrix with iterative refinement. The same physics as the dense path; the
 * states are counted against the degree of indeterminacy, and when the rings do not supply
 * exactly that many independent states (a drawing with crossing members, releases that
 * make a ring a mechanism) the method declines and says so.
 *
 * Over 400 lines because it is one method read top to bottom (the drawing's faces, the
 * ring states, the normal equations, the per-case compatibility); the plane drawing is
 * already apart ({@link PlaneDrawing}).
 */
final class SparseForceMethod {

    /** Singular values of a ring's scaled equilibrium matrix below this fraction of the largest are zero. */
    static final double RING_NULL_TOLERANCE = 1e-10;
    /** Rings of more members than this are not analysed (their local null space is a dense SVD). */
    static final int LONGEST_RING = 200;
    /** Refinement steps after each normal-equation solve (each gains about the digits the squaring cost). */
    static final int REFINEMENTS = 3;

    private final Model model;
    private final EquilibriumMatrix eq;
    private final int m, n;
    private final ScaledEquilibrium scaled; // A_s = R A C, its equations in banded order
    private final ForceEngine method;     // the member loads and member functions to use
    private final SkylineLdl normal;     // the factored normal equations A_s A_s^T

    private SparseForceMethod(Model model, EquilibriumMatrix eq, ForceEngine method) {
        this.model = model;
        this.method = method;
        this.eq = eq;
        m = eq.equations().size();
        n = eq.unknowns().size();
        scaled = ScaledEquilibrium.of(model, eq);
        for (int j = 0; j < n; j++) {
            EquilibriumMatrix.Unknown u = eq.unknowns().get(j);
            (u.kind() == EquilibriumMatrix.Kind.REACTION ? unknownsOfSupport : unknownsOfMember)
                    .computeIfAbsent(u.owner(), k -> new ArrayList<>()).add(j);
        }
        normal = scaled.normalMatrix().factor();
    }

    /** Solves the model, or returns a result whose instability says why this method declined. */
    static EngineResult solve(Model model, EquilibriumMatrix eq, ForceEngine method) {
        SparseForceMethod s = new SparseForceMethod(model, eq, method);
        return s.run(method.name());
    }

    private EngineResult run(String engine) {
        if (!normal.isNonSingular()) return EngineResult.unstable(engine, "the equilibrium equations are singular: no statically admissible state");
        // local self-stress states from the rings
        PlaneDrawing drawing = PlaneDrawing.of(model);
        if (!drawing.plane()) {
            return EngineResult.declined(engine, "the sparse force method needs a plane drawing without crossing members; "
                    + "this model has crossings, so its rings cannot be read from the drawing");
        }
        int degree = n - m;
        List<Map<Integer, Double>> states = selfStressStates(drawing, degree);
        if (states.size() != degree) {
            return EngineResult.declined(engine, "the rings of the drawing give " + states.size() + " self-stress states for a degree of "
                    + degree + " (releases combine rings); the sparse force method declines this model");
        }
        Flexibility flex = Flexibility.of(model, eq);
        int r = states.size();
        // the states in reverse Cuthill-McKee order of their coupling: at[t] is state t's place
        int[] at = stateOrder(states, flex);
        SkylineLdl delta = compatibilityMatrix(states, flex, at).factor();
        if (!delta.isNonSingular()) {
            return EngineResult.declined(engine, "the ring self-stress states are not independent; the sparse force method declines this model");
        }
        Map<String, Integer> row = new HashMap<>();
        for (int i = 0; i < m; i++) row.put(eq.equations().get(i).node() + "/" + eq.equations().get(i).direction(), i);
        Map<String, Solution> cases = new LinkedHashMap<>();
        Compatibility compat = new Compatibility(states, at, delta, flex);
        // the load cases share the factorizations and nothing else: solved side by side, gathered in order
        List<Solution> solved = model.loadCases().parallelStream().map(c -> solveCase(c, row, compat)).toList();
        for (int k = 0; k < solved.size(); k++) cases.put(model.loadCases().get(k).name(), solved.get(k));
        List<String> notes = List.of("redundants: " + r + " self-stress states of the " + drawing.faces().size()
                        + " closed rings (sparse force method; the working is not listed at this size)",
                "flexibility matrix: " + r + " x " + r + ", " + delta.storedEntries() + " stored entries (skyline, RCM order)");
        return new EngineResult(engine, true, null, cases, notes);
    }

    /**
     * The self-stress states, each state's place in the factored compatibility matrix, that
     * factorization, and the flexibility it was formed with: what every load case shares.
     */
    private record Compatibility(List<Map<Integer, Double>> states, int[] at, SkylineLdl delta, Flexibility flex) {
    }

    /**
     * One load case: a particular equilibrium solution x0 (least norm), the redundants z
     * from compatibility, x = x0 + X z, then the node displacements from the compatible
     * deformations.
     */
    private Solution solveCase(LoadCase c, Map<String, Integer> row, Compatibility compat) {
        int r = compat.states().size();
        Map<String, MemberActions> actions = method.loading().of(model, c);
        Map<String, double[]> particular = new HashMap<>();
        double[] p = ForceEngine.nodeLoads(model, c, actions, row, m, particular);
        double[] bs = new double[m];
        for (int i = 0; i < m; i++) bs[i] = -p[i] * scaled.rowScale(i);
        double[] xs = leastNorm(bs);
        double[] x0 = new double[n];
        for (int j = 0; j < n; j++) x0[j] = xs[j] * scaled.colScale(j);
        double[] e0 = compat.flex().initialDeformation(model, eq, actions, particular);
        double[] d = ForceEngine.settlements(model, eq, c);
        double[] f0 = compat.flex().times(x0);
        double[] gs = new double[n];
        for (int j = 0; j < n; j++) gs[j] = (f0[j] + e0[j] - d[j]) * scaled.colScale(j);
        double[] rhs = new double[r];
        for (int t = 0; t < r; t++) {
            double s = 0;
            for (var en : compat.states().get(t).entrySet()) s += en.getValue() * gs[en.getKey()];
            rhs[compat.at()[t]] = -s;
        }
        double[] z = compat.delta().solve(rhs);
        double[] x = x0.clone();
        for (int t = 0; t < r; t++) {
            double zt = z[compat.at()[t]];
            for (var en : compat.states().get(t).entrySet()) x[en.getKey()] += zt * en.getValue() * scaled.colScale(en.getKey());
        }
        double[] fx = compat.flex().times(x);
        double[] ws = new double[n];
        // virtual work with A x_v = -p_v: the node displacements satisfy A^T u = -(F x + e - d)
        for (int j = 0; j < n; j++) ws[j] = -(fx[j] + e0[j] - d[j]) * scaled.colScale(j);
        double[] us = compatibleDisplacements(ws);
        double[] u = new double[m];
        for (int i = 0; i < m; i++) u[i] = us[i] * scaled.rowScale(i);
        return ForceEngine.assemble(model, eq, c, actions, particular, x, u, row, method.memberFunctions());
    }

    /**
     * Independent self-stress states from the rings, smallest first (the long ones, a chord
     * between two supports, only while states are still missing), then from pairs of
     * neighbouring rings; stops at {@code degree} states.
     */
    private List<Map<Integer, Double>> selfStressStates(PlaneDrawing drawing, int degree) {
        // rings smallest first; the long ones (a chord between two supports) only while states are still missing
        List<int[]> faces = new ArrayList<>(drawing.faces());
        faces.sort(Comparator.comparingInt(f -> f.length));
        List<Map<Integer, Double>> states = new ArrayList<>();
        List<int[]> taken = new ArrayList<>();
        for (int[] face : faces) {
            if (states.size() >= degree) break;
            if (face.length > LONGEST_RING) break;
            addStates(states, ringStates(drawing, face, states));
            taken.add(face);
        }
        // states that need two neighbouring rings together (a continuous beam on pinned supports,
        // a hinge between two panels): each pair of rings that share a member, beyond the states found
        Map<Integer, List<Integer>> facesOfEdge = new HashMap<>();
        for (int f = 0; f < taken.size(); f++) for (int e : taken.get(f)) facesOfEdge.computeIfAbsent(e, k -> new ArrayList<>()).add(f);
        Set<Long> tried = new HashSet<>();
        for (int a = 0; a < taken.size() && states.size() < degree; a++) {
            TreeSet<Integer> neighbours = new TreeSet<>();
            for (int e : taken.get(a)) for (int f : facesOfEdge.get(e)) if (f > a) neighbours.add(f);
            for (int b : neighbours) {
                if (states.size() >= degree || !tried.add((long) a * taken.size() + b)) continue;
                int[] union = IntStream.concat(Arrays.stream(taken.get(a)), Arrays.stream(taken.get(b)))
                        .distinct().toArray();
                if (union.length > LONGEST_RING) continue;
                addStates(states, ringStates(drawing, union, states));
            }
        }
        return states;
    }

    /** The flexibility blocks (keyed by a block's first unknown) each state touches. */
    private Map<Integer, List<Integer>> touching(List<Map<Integer, Double>> states, Flexibility flex) {
        int r = states.size();
        Map<Integer, List<Integer>> statesAt = new HashMap<>();
        for (int t = 0; t < r; t++) for (int j : states.get(t).keySet()) statesAt.computeIfAbsent(j, k -> new ArrayList<>()).add(t);
        Map<Integer, List<Integer>> touching = new HashMap<>(); // flexibility block (first unknown) -> states
        for (int j = 0; j < n; j++) {
            int key = flex.group(j)[0];
            List<Integer> st = statesAt.get(j);
            if (st == null) continue;
            List<Integer> l = touching.computeIfAbsent(key, k -> new ArrayList<>());
            for (int t : st) if (!l.contains(t)) l.add(t);
        }
        return touching;
    }

    /** Each state's place in the reverse Cuthill-McKee order of the states' coupling through shared flexibility blocks. */
    private int[] stateOrder(List<Map<Integer, Double>> states, Flexibility flex) {
        int r = states.size();
        List<int[]> pairs = new ArrayList<>();
        for (List<Integer> l : touching(states, flex).values()) for (int a : l) for (int b : l) if (a < b) pairs.add(new int[]{a, b});
        int[] order = NodeOrdering.reverseCuthillMcKee(r, pairs);
        int[] at = new int[r];
        for (int k = 0; k < r; k++) at[order[k]] = k;
        return at;
    }

    /** The compatibility matrix delta = X^T F_s X, assembled block by block in the states' order. */
    private SkylineMatrix compatibilityMatrix(List<Map<Integer, Double>> states, Flexibility flex, int[] at) {
        int r = states.size();
        Map<Integer, List<Integer>> touching = touching(states, flex);
        int[] dfirst = new int[r];
        for (int t = 0; t < r; t++) dfirst[t] = t;
        for (List<Integer> l : touching.values()) {
            int min = Integer.MAX_VALUE;
            for (int t : l) min = Math.min(min, at[t]);
            for (int t : l) dfirst[at[t]] = Math.min(dfirst[at[t]], min);
        }
        SkylineMatrix deltaMatrix = new SkylineMatrix(dfirst);
        for (var e : touching.entrySet()) {
            int[] group = flex.group(e.getKey());
            for (int a : e.getValue()) {
                for (int b : e.getValue()) {
                    if (at[a] > at[b]) continue;
                    double v = 0;
                    for (int p = 0; p < group.length; p++) {
                        double xa = states.get(a).getOrDefault(group[p], 0.0);
                        if (xa == 0) continue;
                        for (int q = 0; q < group.length; q++) {
                            double xb = states.get(b).getOrDefault(group[q], 0.0);
                            if (xb == 0) continue;
                            v += xa * flex.coefficient(group[p], q) * scaled.colScale(group[p]) * scaled.colScale(group[q]) * xb;
                        }
                    }
                    if (v != 0) deltaMatrix.add(at[a], at[b], v);
                }
            }
        }
        return deltaMatrix;
    }

    /** A_s x for unknowns x, by equation index. */
    private double[] times(double[] x) {
        double[] out = new double[m];
        for (int j = 0; j < n; j++) {
            if (x[j] == 0) continue;
            int[] rows = scaled.columnRows(j);
            double[] vals = scaled.columnValues(j);
            for (int k = 0; k < rows.length; k++) out[rows[k]] += vals[k] * x[j];
        }
        return out;
    }

    private double[] transposeTimes(double[] y) {
        double[] out = new double[n];
        for (int j = 0; j < n; j++) {
            double s = 0;
            int[] rows = scaled.columnRows(j);
            double[] vals = scaled.columnValues(j);
            for (int k = 0; k < rows.length; k++) s += vals[k] * y[rows[k]];
            out[j] = s;
        }
        return out;
    }

    private double[] normalSolve(double[] byEquation) {
        double[] b = new double[m];
        for (int i = 0; i < m; i++) b[scaled.position(i)] = byEquation[i];
        double[] y = normal.solve(b);
        double[] out = new double[m];
        for (int i = 0; i < m; i++) out[i] = y[scaled.position(i)];
        return out;
    }

    /** The least-norm x with A_s x = b (exact for the square-or-wide A_s of a stable model), refined. */
    private double[] leastNorm(double[] b) {
        double[] x = transposeTimes(normalSolve(b));
        for (int k = 0; k < REFINEMENTS; k++) {
            double[] ax = times(x);
            double[] res = new double[m];
            for (int i = 0; i < m; i++) res[i] = b[i] - ax[i];
            double[] dx = transposeTimes(normalSolve(res));
            for (int j = 0; j < n; j++) x[j] += dx[j];
        }
        return x;
    }

    /** u with A_s^T u = w for compatible deformations w (the least-squares solution, exact when w is compatible), refined. */
    private double[] compatibleDisplacements(double[] w) {
        double[] u = normalSolve(times(w));
        for (int k = 0; k < REFINEMENTS; k++) {
            double[] atu = transposeTimes(u);
            double[] res = new double[n];
            for (int j = 0; j < n; j++) res[j] = w[j] - atu[j];
            double[] du = normalSolve(times(res));
            for (int i = 0; i < m; i++) u[i] += du[i];
        }
        return u;
    }

    /**
     * Removes from w its components along the orthonormal basis (twice, for accuracy); if a
     * part of at least 1e-6 of w remains, normalizes it, adds it to the basis and returns true.
     */
    private static boolean orthogonalize(double[] w, List<double[]> basis) {
        double before = 0;
        for (double x : w) before += x * x;
        before = Math.sqrt(before);
        if (before == 0) return false;
        for (int pass = 0; pass < 2; pass++) {
            for (double[] b : basis) {
                double d = 0;
                for (int i = 0; i < w.length; i++) d += w[i] * b[i];
                for (int i = 0; i < w.length; i++) w[i] -= d * b[i];
            }
        }
        double after = 0;
        for (double x : w) after += x * x;
        after = Math.sqrt(after);
        if (after <= 1e-6 * before) return false;
        for (int i = 0; i < w.length; i++) w[i] /= after;
        basis.add(w.clone());
        return true;
    }

    /** The unknowns (columns) owned by each member, and by each support. */
    private final Map<String, List<Integer>> unknownsOfMember = new HashMap<>(), unknownsOfSupport = new HashMap<>();

    /** Index of the states found so far by the unknowns they involve. */
    private final Map<Integer, List<Integer>> statesByUnknown = new HashMap<>();

    private void addStates(List<Map<Integer, Double>> states, List<Map<Integer, Double>> more) {
        for (Map<Integer, Double> st : more) {
            for (int j : st.keySet()) statesByUnknown.computeIfAbsent(j, k -> new ArrayList<>()).add(states.size());
            states.add(st);
        }
    }

    /**
     * The self-stress states local to one ring (or union of rings): the null space of its own
     * equilibrium equations, less the span of the {@code known} states it contains.
     */
    private List<Map<Integer, Double>> ringStates(PlaneDrawing drawing, int[] face, List<Map<Integer, Double>> known) {
        Set<String> memberNames = new LinkedHashSet<>(), supports = new LinkedHashSet<>();
        for (int e : face) {
            if (drawing.isMember(e)) memberNames.add(drawing.members().get(e).name());
            else supports.add(drawing.supportNodes().get(e - drawing.members().size()));
        }
        List<Integer> cols = new ArrayList<>();
        for (String mem : memberNames) cols.addAll(unknownsOfMember.getOrDefault(mem, List.of()));
        for (String sup : supports) cols.addAll(unknownsOfSupport.getOrDefault(sup, List.of()));
        Collections.sort(cols);
        TreeSet<Integer> rows = new TreeSet<>();
        for (int j : cols) for (int i : scaled.columnRows(j)) rows.add(i);
        List<Integer> rowList = new ArrayList<>(rows);
        Map<Integer, Integer> rowAt = new HashMap<>();
        for (int k = 0; k < rowList.size(); k++) rowAt.put(rowList.get(k), k);
        int nr = Math.max(rowList.size(), cols.size()), nc = cols.size();
        double[][] a = new double[nr][nc];
        for (int c = 0; c < nc; c++) {
            int j = cols.get(c);
            int[] colRows = scaled.columnRows(j);
            double[] vals = scaled.columnValues(j);
            for (int k = 0; k < colRows.length; k++) a[rowAt.get(colRows[k])][c] = vals[k];
        }
        List<Map<Integer, Double>> out = new ArrayList<>();
        if (nc == 0) return out;
        SingularValueDecomposition svd = new SingularValueDecomposition(new Array2DRowRealMatrix(a, false));
        double[] sv = svd.getSingularValues();
        RealMatrix v = svd.getV();
        double max = sv.length == 0 ? 0 : sv[0];
        // an orthonormal basis, in the ring's coordinates, of the known states lying inside it
        Map<Integer, Integer> colAt = new HashMap<>();
        for (int c = 0; c < nc; c++) colAt.put(cols.get(c), c);
        List<double[]> basis = new ArrayList<>();
        Set<Integer> candidates = new TreeSet<>();
        for (int j : cols) candidates.addAll(statesByUnknown.getOrDefault(j, List.of()));
        for (int idx : candidates) {
            Map<Integer, Double> st = known.get(idx);
            if (!colAt.keySet().containsAll(st.keySet())) continue;
            double[] w = new double[nc];
            for (var e : st.entrySet()) w[colAt.get(e.getKey())] = e.getValue();
            orthogonalize(w, basis);
        }
        for (int k = 0; k < nc; k++) {
            if (k < sv.length && sv[k] > RING_NULL_TOLERANCE * max) continue;
            double[] w = new double[nc];
            for (int c = 0; c < nc; c++) w[c] = v.getEntry(c, k);
            if (!orthogonalize(w, basis)) continue; // already spanned by known states
            Map<Integer, Double> state = new LinkedHashMap<>();
            double big = 0;
            for (double x : w) big = Math.max(big, Math.abs(x));
            for (int c = 0; c < nc; c++) if (Math.abs(w[c]) > 1e-13 * big) state.put(cols.get(c), w[c]);
            out.add(state);
        }
        return out;
    }
}
