package plumbline.solve.force;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.DecompositionSolver;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import plumbline.model.LoadCase;
import plumbline.model.Member;
import plumbline.model.Model;
import plumbline.model.Node;
import plumbline.model.NodeLoad;
import plumbline.model.Settlement;
import plumbline.model.Support;
import plumbline.solve.Engine;
import plumbline.solve.EngineResult;
import plumbline.solve.Equilibrium;
import plumbline.solve.ForceWorking;
import plumbline.solve.MemberActions;
import plumbline.solve.MemberFunctions;
import plumbline.solve.MemberLoading;
import plumbline.solve.MemberSolution;
import plumbline.solve.Peaks;
import plumbline.solve.Solution;
import plumbline.statics.EquilibriumMatrix;
import plumbline.statics.ScaledEquilibrium;

/**
 * The force (flexibility) method. Unknowns are the independent forces of the equilibrium
 * matrix A (member axial forces and end moments, reactions and spring forces): A x = -p,
 * with p the node loads plus what each member's loads put on its nodes when it is released
 * to a simple beam. Redundants z are the columns left after choosing a basis of A
 * (reactions and end moments are released first, as an engineer would), or those the user
 * names; every solution is x = x0 + X z, with x0 the primary structure's response to the
 * loads and X the self-stress states of unit redundants.
 *
 * <p>Compatibility comes from virtual work: the flexibility f of each member (unit-load
 * integrals of n n / EA + m m / EI, exact), its initial deformations e (the integrals of the
 * unit diagrams against the released member's load diagrams, and the thermal strain and
 * curvature), spring flexibility 1/k, and the prescribed settlements d of the reaction
 * components. The equations (X^T F X) z = -X^T (F x0 + e - d) are the classic
 * delta_ij z_j + Delta_i0 = 0. Node displacements come from unit virtual loads on the
 * primary structure: u_i = x_i^T (F x + e - d).
 *
 * Over 400 lines on purpose: the whole dense method (primary structure, redundants,
 * flexibility, compatibility, recovery of displacements and member actions) in one place,
 * read as the textbook derivation; the sparse method and the closed-form member terms are
 * apart.
 */
public final class ForceEngine implements Engine {

    /** Columns whose residual norm after projection falls below this fraction of their own norm add no rank. */
    static final double INDEPENDENCE_TOLERANCE = 1e-9;

    /**
     * The force engine works on dense matrices (Gauss-Jordan choice of the primary
     * structure, LU of the primary equilibrium matrix): cost grows as the cube of the
     * number of node equations. Above this many it is not run.
     */
    public static final int DENSE_LIMIT = 400;
    /** When the sparse path declines, the dense one is still tried up to this many equations (some seconds). */
    public static final int DENSE_FALLBACK_LIMIT = 1600;
    /** Above this many node equations even the sparse path is not run (memory of its ring states). */
    public static final int MAX_EQUATIONS = 200_000;

    /** Why the model is too large for this engine, or null when it is not. */
    public static String tooLarge(Model model) {
        return tooLarge(equations(model));
    }

    static String tooLarge(int m) {
        return m > MAX_EQUATIONS ? "the model has " + m + " node equations; the force method takes at most " + MAX_EQUATIONS : null;
    }

    static int equations(Model model) {
        int m = 0;
        Set<String> rot = model.rotationalNodes();
        for (String n : model.nodes().keySet()) m += rot.contains(n) ? 3 : 2;
        return m;
    }

    private final MemberLoading loading;
    private final MemberFunctions functions;

    /** The engine as the tool runs it: the shared member loads, and member functions in closed form of its own. */
    public ForceEngine() {
        this(MemberLoading.SHARED, ForceEngine::closedForm);
    }

    /** An engine with the given member loads and functions: the seam through which tests plant slips. */
    public ForceEngine(MemberLoading loading, MemberFunctions functions) {
        this.loading = loading;
        this.functions = functions;
    }

    /** The member state with the peaks of the force method's own closed-form functions ({@link ClosedFormMember}). */
    static MemberSolution closedForm(double[] ends, MemberActions a, double eiNm2, double vStartM, double vEndM) {
        Peaks p = ClosedFormMember.of(new double[]{ends[0], ends[1], ends[2]}, a)
                .peaks(eiNm2, a.thermalCurvaturePerM(), vStartM, vEndM);
        return MemberSolution.withPeaks(ends, a, eiNm2, vStartM, vEndM, p);
    }

    /** The sparse path (closed-ring self-stress states) whatever the size, for tests. */
    public EngineResult solveSparse(Model model) {
        return SparseForceMethod.solve(model, EquilibriumMatrix.of(model), this);
    }

    MemberLoading loading() {
        return loading;
    }

    @Override
    public String name() {
        return "force";
    }

    @Override
    public MemberFunctions memberFunctions() {
        return functions;
    }

    @Override
    public EngineResult solve(Model model) {
        EquilibriumMatrix eq = EquilibriumMatrix.of(model);
        if (eq.equations().size() > DENSE_LIMIT && model.redundants().isEmpty()) {
            EngineResult sparse = SparseForceMethod.solve(model, eq, this);
            if (!sparse.declined() || eq.equations().size() > DENSE_FALLBACK_LIMIT) return sparse;
        }
        int m = eq.equations().size(), n = eq.unknowns().size();
        List<EquilibriumMatrix.Unknown> unk = eq.unknowns();
        // choose the basis: axial forces first, then end moments, then reactions; user redundants never
        List<Integer> order = new ArrayList<>();
        for (EquilibriumMatrix.Kind k : new EquilibriumMatrix.Kind[]{EquilibriumMatrix.Kind.AXIAL,
                EquilibriumMatrix.Kind.MOMENT_START, EquilibriumMatrix.Kind.MOMENT_END, EquilibriumMatrix.Kind.REACTION}) {
            for (int j = 0; j < n; j++) if (unk.get(j).kind() == k) order.add(j);
        }
        List<String> named = model.redundants();
        List<String> notes = new ArrayList<>();
        for (String r : named) {
            if (unk.stream().noneMatch(u -> u.label().equals(r))) {
                return EngineResult.unstable(name(), "redundant '" + r + "' is not an unknown of this model; expected one of "
                        + String.join(", ", unk.stream().map(EquilibriumMatrix.Unknown::label).toList()));
            }
        }
        // entries scaled to ratios of forces (ScaledEquilibrium), so the pivot test is scale-free
        double[][] scaled = new double[m][n];
        ScaledEquilibrium as = ScaledEquilibrium.of(model, eq);
        for (int j = 0; j < n; j++) {
            int[] rows = as.columnRows(j);
            double[] vals = as.columnValues(j);
            for (int k = 0; k < rows.length; k++) scaled[rows[k]][j] = vals[k];
        }
        // Gauss-Jordan selection of the basis, column by column in order of preference: the basis
        // vectors are kept in reduced row-echelon form (each zero at the others' pivot rows), so a
        // new column is reduced by at most the pivots of its own six non-zeros
        List<Integer> basic = new ArrayList<>();
        List<double[]> pivotVectors = new ArrayList<>();
        int[] pivotOfRow = new int[m];
        Arrays.fill(pivotOfRow, -1);
        for (int j : order) {
            if (named.contains(unk.get(j).label())) continue;
            if (basic.size() == m) break;
            double[] v = new double[m];
            double norm0 = 0;
            for (int i = 0; i < m; i++) {
                v[i] = scaled[i][j];
                norm0 = Math.max(norm0, Math.abs(v[i]));
            }
            if (norm0 == 0) continue;
            for (int i = 0; i < m; i++) {
                if (v[i] == 0 || pivotOfRow[i] < 0) continue;
                double f = v[i];
                double[] b = pivotVectors.get(pivotOfRow[i]);
                for (int t = 0; t < m; t++) if (b[t] != 0) v[t] -= f * b[t];
                v[i] = 0;
            }
            int q = -1;
            for (int i = 0; i < m; i++) if (pivotOfRow[i] < 0 && (q < 0 || Math.abs(v[i]) > Math.abs(v[q]))) q = i;
            if (q < 0 || Math.abs(v[q]) <= INDEPENDENCE_TOLERANCE * norm0) continue;
            double pv = v[q];
            for (int t = 0; t < m; t++) v[t] /= pv;
            v[q] = 1;
            for (double[] b : pivotVectors) {
                double f = b[q];
                if (f == 0) continue;
                for (int t = 0; t < m; t++) if (v[t] != 0) b[t] -= f * v[t];
                b[q] = 0;
            }
            pivotOfRow[q] = pivotVectors.size();
            pivotVectors.add(v);
            basic.add(j);
        }
        if (basic.size() < m) {
            return EngineResult.unstable(name(), "the equilibrium equations have rank " + basic.size() + " < " + m
                    + (named.isEmpty() ? "" : " with the named redundants released")
                    + ": no statically admissible primary structure (a mechanism)");
        }
        List<Integer> redundant = new ArrayList<>();
        for (int j = 0; j < n; j++) if (!basic.contains(j)) redundant.add(j);
        double[][] ab = new double[m][m];
        for (int i = 0; i < m; i++) for (int k = 0; k < m; k++) ab[i][k] = eq.get(i, basic.get(k));
        DecompositionSolver primary = new LUDecomposition(new Array2DRowRealMatrix(ab, false), 0).getSolver();

        // self-stress states X (n x r): unit redundant, basic forces from equilibrium
        int r = redundant.size();
        double[][] x = new double[n][r];
        for (int k = 0; k < r; k++) {
            int j = redundant.get(k);
            double[] rhs = new double[m];
            for (int i = 0; i < m; i++) rhs[i] = -eq.get(i, j);
            double[] xb = primary.solve(new org.apache.commons.math3.linear.ArrayRealVector(rhs, false)).toArray();
            for (int b = 0; b < m; b++) x[basic.get(b)][k] = xb[b];
            x[j][k] = 1;
        }
        // flexibility of every unknown (block diagonal per member, 1/k per spring)
        Flexibility flex = Flexibility.of(model, eq);
        RealMatrix delta = r == 0 ? null : new Array2DRowRealMatrix(transposeTimes(x, flex.times(x)), false);
        DecompositionSolver compat = r == 0 ? null : new LUDecomposition(delta, 0).getSolver();
        if (r > 0 && !compat.isNonSingular()) {
            return EngineResult.unstable(name(), "the compatibility equations are singular (a redundant with no flexibility)");
        }
        // unit virtual loads at every node equation: A_B x_v = -e_i, so u_i = x_v . w = -(A_B^-T w_B)_i:
        // one solve with the transposed primary matrix per load case gives every displacement
        double[][] abT = new double[m][m];
        for (int i = 0; i < m; i++) for (int k = 0; k < m; k++) abT[k][i] = ab[i][k];
        DecompositionSolver primaryT = new LUDecomposition(new Array2DRowRealMatrix(abT, false), 0).getSolver();

        Map<String, Integer> row = new HashMap<>();
        for (int i = 0; i < m; i++) {
            EquilibriumMatrix.Equation e = eq.equations().get(i);
            row.put(e.node() + "/" + e.direction(), i);
        }
        Map<String, Solution> cases = new LinkedHashMap<>();
        Map<String, double[]> deltaZeros = new LinkedHashMap<>(), redundantValues = new LinkedHashMap<>();
        StringBuilder working = new StringBuilder();
        working.append("redundants: ").append(r == 0 ? "none (statically determinate: solved by equilibrium alone)"
                : String.join(", ", redundant.stream().map(j -> unk.get(j).label()).toList()));
        notes.add(working.toString());
        if (r == 0 && model.members().values().stream().allMatch(Member::truss)) notes.add(jointOrder(model));
        for (LoadCase c : model.loadCases()) {
            Map<String, MemberActions> actions = loading.of(model, c);
            Map<String, double[]> particular = new HashMap<>();
            double[] p = nodeLoads(model, c, actions, row, m, particular);
            double[] rhs = new double[m];
            for (int i = 0; i < m; i++) rhs[i] = -p[i];
            double[] xb = primary.solve(new org.apache.commons.math3.linear.ArrayRealVector(rhs, false)).toArray();
            double[] x0 = new double[n];
            for (int b = 0; b < m; b++) x0[basic.get(b)] = xb[b];
            double[] e0 = flex.initialDeformation(model, eq, actions, particular);
            double[] d = settlements(model, eq, c);
            double[] fx0 = flex.times(x0);
            double[] g = new double[n];
            for (int j = 0; j < n; j++) g[j] = fx0[j] + e0[j] - d[j];
            double[] z = new double[r];
            if (r > 0) {
                double[] delta0 = new double[r];
                for (int j = 0; j < n; j++) {
                    if (g[j] == 0) continue;
                    for (int k = 0; k < r; k++) delta0[k] += x[j][k] * g[j];
                }
                double[] neg = new double[r];
                for (int k = 0; k < r; k++) neg[k] = -delta0[k];
                z = compat.solve(new org.apache.commons.math3.linear.ArrayRealVector(neg, false)).toArray();
                if (r <= ForceWorking.LISTED_UP_TO) {
                    deltaZeros.put(c.name(), delta0.clone());
                    redundantValues.put(c.name(), z.clone());
                }
            }
            double[] xs = x0.clone();
            for (int j = 0; j < n; j++) for (int k = 0; k < r; k++) xs[j] += x[j][k] * z[k];
            double[] fxs = flex.times(xs);
            double[] work = new double[n];
            for (int j = 0; j < n; j++) work[j] = fxs[j] + e0[j] - d[j];
            // displacement at equation i: the virtual force system's work on the real deformations
            double[] wb = new double[m];
            for (int b = 0; b < m; b++) wb[b] = -work[basic.get(b)];
            double[] u = primaryT.solve(new org.apache.commons.math3.linear.ArrayRealVector(wb, false)).toArray();
            cases.put(c.name(), assemble(model, eq, c, actions, particular, xs, u, row, functions));
        }
        ForceWorking record = new ForceWorking(redundant.stream().map(j -> unk.get(j).label()).toList(),
                r > 0 && r <= ForceWorking.LISTED_UP_TO ? delta.getData() : new double[0][], deltaZeros, redundantValues);
        return new EngineResult(name(), true, null, cases, notes, List.of(), false, record);
    }

    /**
     * End forces on the member released to a simple beam (no end moments, N = 0 at the
     * start), local {fx_i, fy_i, m_i, fx_j, fy_j, m_j}, from the member's own equilibrium.
     */
    static double[] released(MemberActions a) {
        double len = a.lengthM();
        double[] res = a.resultantAboutStart();
        double pxAtStart = 0;
        for (MemberActions.Point pt : a.points()) if (pt.aM() == 0) pxAtStart += pt.px();
        double fxi = -pxAtStart;
        double fxj = -res[0] - fxi;
        double fyj = -res[2] / len;
        double fyi = -res[1] - fyj;
        return new double[]{fxi, fyi, 0, fxj, fyj, 0};
    }

    /**
     * The loads on the node equations of case c: node loads, plus what each member's loads put
     * on its nodes when it is released to a simple beam; the released end forces go into
     * {@code particular}.
     */
    static double[] nodeLoads(Model model, LoadCase c, Map<String, MemberActions> actions, Map<String, Integer> row, int m,
                              Map<String, double[]> particular) {
        double[] p = new double[m];
        for (NodeLoad nl : c.nodeLoads()) {
            p[row.get(nl.node() + "/0")] += nl.fxN();
            p[row.get(nl.node() + "/1")] += nl.fyN();
            Integer rz = row.get(nl.node() + "/2");
            if (rz != null) p[rz] += nl.mzNm();
        }
        for (var ae : actions.entrySet()) {
            Member mem = model.member(ae.getKey());
            double[] fp = released(ae.getValue());
            particular.put(mem.name(), fp);
            addToNodes(model, mem, fp, p, row);
        }
        return p;
    }

    private static void addToNodes(Model model, Member mem, double[] f, double[] p, Map<String, Integer> row) {
        double[] dir = model.directionOf(mem);
        double cx = dir[0], cy = dir[1];
        // the member pushes on its nodes with the opposite of the forces on its ends
        p[row.get(mem.from() + "/0")] -= f[0] * cx - f[1] * cy;
        p[row.get(mem.from() + "/1")] -= f[0] * cy + f[1] * cx;
        p[row.get(mem.to() + "/0")] -= f[3] * cx - f[4] * cy;
        p[row.get(mem.to() + "/1")] -= f[3] * cy + f[4] * cx;
    }

    static double[] settlements(Model model, EquilibriumMatrix eq, LoadCase c) {
        double[] d = new double[eq.unknowns().size()];
        for (Settlement s : c.settlements()) {
            for (int j = 0; j < d.length; j++) {
                EquilibriumMatrix.Unknown u = eq.unknowns().get(j);
                if (u.kind() == EquilibriumMatrix.Kind.REACTION && u.owner().equals(s.node()) && !Double.isNaN(s.value(u.direction()))) {
                    d[j] += s.value(u.direction());
                }
            }
        }
        return d;
    }

    static Solution assemble(Model model, EquilibriumMatrix eq, LoadCase c, Map<String, MemberActions> actions,
                             Map<String, double[]> particular, double[] xs, double[] u, Map<String, Integer> row,
                             MemberFunctions functions) {
        Map<String, double[]> disp = new LinkedHashMap<>();
        for (Node nd : model.nodes().values()) {
            Integer rz = row.get(nd.name() + "/2");
            disp.put(nd.name(), new double[]{u[row.get(nd.name() + "/0")], u[row.get(nd.name() + "/1")], rz == null ? 0 : u[rz]});
        }
        Map<String, double[]> reactions = new LinkedHashMap<>();
        for (Support s : model.supports().values()) reactions.put(s.node(), new double[3]);
        Map<String, double[]> ends = new LinkedHashMap<>();
        for (Member mem : model.members().values()) {
            double[] fp = particular.get(mem.name());
            ends.put(mem.name(), fp == null ? new double[6] : fp.clone());
        }
        for (int j = 0; j < xs.length; j++) {
            EquilibriumMatrix.Unknown un = eq.unknowns().get(j);
            if (un.kind() == EquilibriumMatrix.Kind.REACTION) {
                Support s = model.supports().get(un.owner());
                double cs = Math.cos(s.angleRad()), sn = Math.sin(s.angleRad());
                double[] rr = reactions.get(un.owner());
                if (un.direction() == 0) {
                    rr[0] += xs[j] * cs;
                    rr[1] += xs[j] * sn;
                } else if (un.direction() == 1) {
                    rr[0] -= xs[j] * sn;
                    rr[1] += xs[j] * cs;
                } else {
                    rr[2] += xs[j];
                }
            } else {
                Member mem = model.member(un.owner());
                double[] unit = EquilibriumMatrix.unitEndForces(model, mem, un.kind());
                double[] f = ends.get(mem.name());
                for (int k = 0; k < 6; k++) f[k] += unit[k] * xs[j];
            }
        }
        Map<String, MemberSolution> members = new LinkedHashMap<>();
        for (Member mem : model.members().values()) {
            double[] dir = model.directionOf(mem);
            double[] ui = disp.get(mem.from()), uj = disp.get(mem.to());
            double vi = -ui[0] * dir[1] + ui[1] * dir[0], vj = -uj[0] * dir[1] + uj[1] * dir[0];
            MemberActions a = actions.getOrDefault(mem.name(), MemberActions.none(model.lengthM(mem)));
            double ei = model.bendingStiffnessNm2(mem);
            members.put(mem.name(), functions.solve(ends.get(mem.name()), a, ei, vi, vj));
        }
        Solution s = new Solution(c.name(), disp, reactions, members, 0);
        double res = Equilibrium.residual(model, s, Map.of(c.name(), 1.0));
        return new Solution(c.name(), disp, reactions, members, res);
    }

    /**
     * The order in which the method of joints solves a determinate truss: repeatedly a joint
     * with at most two unknown forces (member forces and reaction components), after the
     * reactions from the equilibrium of the whole truss when no joint starts with two.
     */
    static String jointOrder(Model model) {
        Map<String, List<Member>> at = new LinkedHashMap<>();
        for (Node n : model.nodes().values()) at.put(n.name(), new ArrayList<>());
        for (Member m : model.members().values()) {
            at.get(m.from()).add(m);
            at.get(m.to()).add(m);
        }
        Set<String> known = new HashSet<>();
        Set<String> done = new HashSet<>();
        boolean reactionsKnown = false;
        List<String> steps = new ArrayList<>();
        while (done.size() < at.size()) {
            String pick = null;
            List<String> unknowns = null;
            for (var e : at.entrySet()) {
                if (done.contains(e.getKey())) continue;
                List<String> u = new ArrayList<>();
                for (Member m : e.getValue()) if (!known.contains(m.name())) u.add(m.name());
                Support s = model.supports().get(e.getKey());
                if (s != null && !reactionsKnown) for (int d = 0; d < 2; d++) if (s.reacts(d)) u.add(e.getKey() + (d == 0 ? ".Rx" : ".Ry"));
                if (u.size() <= 2) {
                    pick = e.getKey();
                    unknowns = u;
                    break;
                }
            }
            if (pick == null) {
                if (reactionsKnown) {
                    steps.add("(no joint with two unknowns is left: the rest needs simultaneous equations or the method of sections)");
                    break;
                }
                reactionsKnown = true;
                steps.add("reactions from the equilibrium of the whole truss");
                continue;
            }
            for (String u : unknowns) if (!u.contains(".")) known.add(u);
            done.add(pick);
            steps.add("joint " + pick + (unknowns.isEmpty() ? " (check)" : " (" + String.join(", ", unknowns) + ")"));
        }
        return "method of joints order: " + String.join("; ", steps);
    }

    /** X^T Y for two n x r arrays, skipping the zeros of X (self-stress states are often local). */
    static double[][] transposeTimes(double[][] x, double[][] y) {
        int n = x.length, r = n == 0 ? 0 : x[0].length;
        double[][] out = new double[r][r];
        int[] nz = new int[r];
        for (int j = 0; j < n; j++) {
            int c = 0;
            for (int k = 0; k < r; k++) if (x[j][k] != 0) nz[c++] = k;
            double[] yj = y[j];
            for (int p = 0; p < c; p++) {
                int a = nz[p];
                double xa = x[j][a];
                double[] row = out[a];
                for (int b = 0; b < r; b++) row[b] += xa * yj[b];
            }
        }
        return out;
    }
}
