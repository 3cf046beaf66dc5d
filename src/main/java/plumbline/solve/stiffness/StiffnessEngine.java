package plumbline.solve.stiffness;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicReference;
import java.util.function.BiPredicate;
import plumbline.linalg.NodeOrdering;
import plumbline.linalg.SkylineLdl;
import plumbline.linalg.SkylineMatrix;
import plumbline.model.LoadCase;
import plumbline.model.Member;
import plumbline.model.Model;
import plumbline.model.Node;
import plumbline.model.NodeLoad;
import plumbline.model.Settlement;
import plumbline.model.Support;
import plumbline.solve.Engine;
import plumbline.solve.EngineResult;
import plumbline.solve.EngineWarning;
import plumbline.solve.Equilibrium;
import plumbline.solve.MemberActions;
import plumbline.solve.MemberFunctions;
import plumbline.solve.MemberLoading;
import plumbline.solve.MemberSolution;
import plumbline.solve.SideBySide;
import plumbline.solve.Solution;

/**
 * The direct stiffness (displacement) method for plane frames, beams and trusses.
 *
 * <p>Unknowns are the node displacements (ux, uy, rz) in each node's frame: the global axes,
 * or a support's restraint axes turned by its angle. Each member contributes its
 * Euler-Bernoulli stiffness in local axes, with a released end (hinge, truss) condensed out
 * exactly, transformed by T to the node frames: K = sum T^T k T. Member loads enter as
 * equivalent node loads, the negatives of the fixed-end forces, found by integrating the
 * Hermite shape functions against the load (3-point Gauss, exact to degree 5). Restrained
 * freedoms are prescribed (zero or a settlement); springs add to the diagonal. K_ff is
 * factored once (skyline L D L^T in reverse Cuthill-McKee node order) and every load case
 * is solved as another right-hand side: K_ff u_f = F_f - K_fr u_r.
 *
 * Over 400 lines on purpose: the whole method (element stiffness, fixed-end forces,
 * assembly, factorization, recovery of member end forces) in one place, so a checker reads
 * it as the textbook derivation, with no class shared with the force method.
 */
public final class StiffnessEngine implements Engine {

    /**
     * A pivot ratio below this loses more than eight of the sixteen digits of double
     * precision: the results are reported with a warning naming the place.
     */
    public static final double ILL_CONDITIONED = 1e-8;
    /** Why a nearly singular stiffness matrix matters to the checker. */
    public static final String ILL_CONDITIONED_RULE = "a solution loses digits when the stiffness matrix is nearly singular "
            + "(condition estimate from the factorization)";

    private final MemberLoading loading;
    private final MemberFunctions functions;
    /**
     * The last factorization with what the run said of it: a model of the same structure (the
     * same nodes, members, sections, materials and supports; the diagnosis's variants that
     * change only loads) is solved with it again instead of factoring K_ff anew.
     */
    private final AtomicReference<Reusable> last = new AtomicReference<>();

    private record Reusable(Factored factored, List<String> notes, List<EngineWarning> warnings) {
    }

    /** How many times this engine has factored K_ff (for the test that shows a load variant reuses it). */
    private final AtomicInteger factorizations = new AtomicInteger();

    int factorizations() {
        return factorizations.get();
    }

    /** The engine as the tool runs it: the shared member loads and member functions. */
    public StiffnessEngine() {
        this(MemberLoading.SHARED, MemberFunctions.SHARED);
    }

    /** An engine with the given member loads and functions: the seam through which tests plant slips. */
    public StiffnessEngine(MemberLoading loading, MemberFunctions functions) {
        this.loading = loading;
        this.functions = functions;
    }

    @Override
    public String name() {
        return "stiffness";
    }

    @Override
    public MemberFunctions memberFunctions() {
        return functions;
    }

    /** One member's condensed local stiffness, fixed-end forces per case and the assembly data. */
    private static final class Element {
        Member member;
        int i, j;            // node indices
        int[] dofs = new int[6];
        double[][] kLocal;   // condensed, 6x6
        double[][] t;        // local <- node frames
        double[][] kFrame;   // T^T k T
        double lengthM, angle, ei;
    }

    @Override
    public EngineResult solve(Model model) {
        Reusable r = last.get();
        if (r != null && sameStructure(r.factored().model(), model)) {
            return cases(r.factored().withModel(model), r.notes(), r.warnings());
        }
        return factorAndSolve(model);
    }

    /**
     * Whether two models have the same stiffness: everything but their loads, combinations and
     * claims alike. A variant of a model shares most of its parts with it, so each part is first
     * compared as the same object (the records' own equals is linked through method handles the
     * first time it runs).
     */
    static boolean sameStructure(Model a, Model b) {
        BiPredicate<Object, Object> equal = (x, y) -> x == y || x.equals(y);
        return a == b || (Model.sameParts(a.nodes(), b.nodes(), equal) && Model.sameParts(a.members(), b.members(), equal)
                && Model.sameParts(a.sections(), b.sections(), equal) && Model.sameParts(a.materials(), b.materials(), equal)
                && Model.sameParts(a.supports(), b.supports(), equal));
    }

    private EngineResult cases(Factored kf, List<String> notes, List<EngineWarning> warnings) {
        Model model = kf.model();
        Map<String, Solution> cases = new LinkedHashMap<>();
        // the load cases share the factorization and nothing else: solved side by side (on a large
        // model), gathered in order
        List<Solution> solved = SideBySide.stream(model.loadCases(), model.members().size()).map(kf::solve).toList();
        for (int i = 0; i < solved.size(); i++) cases.put(model.loadCases().get(i).name(), solved.get(i));
        return new EngineResult(name(), true, null, cases, notes, warnings, false, null);
    }

    private EngineResult factorAndSolve(Model model) {
        factorizations.incrementAndGet();
        List<Node> nodes = new ArrayList<>(model.nodes().values());
        Map<String, Integer> index = new HashMap<>();
        for (int k = 0; k < nodes.size(); k++) index.put(nodes.get(k).name(), k);
        int nn = nodes.size();
        boolean[] rotation = new boolean[nn];
        for (String r : model.rotationalNodes()) rotation[index.get(r)] = true;
        double[] frameAngle = new double[nn];
        for (Support s : model.supports().values()) frameAngle[index.get(s.node())] = s.angleRad();
        List<int[]> edges = new ArrayList<>();
        for (Member m : model.members().values()) edges.add(new int[]{index.get(m.from()), index.get(m.to())});
        int[] order = NodeOrdering.reverseCuthillMcKee(nn, edges);

        // number every freedom; restrained freedom k (0-based, in a separate list) gets the code -(k+1)
        int[][] dof = new int[nn][3];
        boolean[][] fixed = new boolean[nn][3];
        int free = 0;
        List<int[]> restrained = new ArrayList<>();
        for (int k : order) {
            Support s = model.supports().get(nodes.get(k).name());
            for (int d = 0; d < 3; d++) {
                if (d == 2 && !rotation[k]) {
                    dof[k][d] = Integer.MIN_VALUE;
                    continue;
                }
                if (s != null && s.fixed(d)) {
                    fixed[k][d] = true;
                    dof[k][d] = -(restrained.size() + 1);
                    restrained.add(new int[]{k, d});
                } else {
                    dof[k][d] = free++;
                }
            }
        }

        List<Element> elements = new ArrayList<>();
        for (Member m : model.members().values()) elements.add(element(model, m, index, dof, frameAngle));

        int[] first = new int[free];
        for (int f = 0; f < free; f++) first[f] = f;
        for (Element e : elements) {
            int min = Integer.MAX_VALUE;
            for (int d : e.dofs) if (d >= 0) min = Math.min(min, d);
            for (int d : e.dofs) if (d >= 0) first[d] = Math.min(first[d], min);
        }
        SkylineMatrix kff = new SkylineMatrix(first);
        for (Element e : elements) {
            for (int a = 0; a < 6; a++) {
                if (e.dofs[a] < 0) continue;
                for (int b = 0; b < 6; b++) {
                    if (e.dofs[b] < 0 || e.dofs[b] < e.dofs[a]) continue;
                    double v = e.kFrame[a][b];
                    if (v != 0) kff.add(e.dofs[a], e.dofs[b], v);
                }
            }
        }
        for (Support s : model.supports().values()) {
            int n = index.get(s.node());
            for (int d = 0; d < 3; d++) {
                if (s.spring(d) > 0 && dof[n][d] >= 0) kff.add(dof[n][d], dof[n][d], s.spring(d));
            }
        }
        SkylineLdl k = kff.factor();
        if (!k.isNonSingular()) {
            int bad = k.singularAt();
            String where = "";
            for (int n = 0; n < nn; n++) for (int d = 0; d < 3; d++) if (dof[n][d] == bad) {
                where = "node " + nodes.get(n).name() + " " + new String[]{"ux", "uy", "rz"}[d];
            }
            return EngineResult.unstable(name(), "the stiffness matrix is singular to working precision at " + where
                    + " (pivot below " + SkylineLdl.PIVOT_TOLERANCE + " of its diagonal): the structure can move there without "
                    + "straining any member, or nearly so (a mechanism, or a near-mechanism such as a very soft spring)");
        }

        List<String> notes = new ArrayList<>();
        List<EngineWarning> warnings = new ArrayList<>();
        notes.add("stiffness matrix: " + free + " free freedoms, " + k.storedEntries() + " stored entries (skyline, RCM order)");
        if (k.smallestPivotRatio() < ILL_CONDITIONED) {
            int at = k.smallestPivotAt();
            String where = "";
            for (int n = 0; n < nn; n++) for (int d = 0; d < 3; d++) if (dof[n][d] == at) where = nodes.get(n).name() + " " + new String[]{"ux", "uy", "rz"}[d];
            String node = where.isEmpty() ? "" : where.substring(0, where.indexOf(' '));
            List<String> at2 = new ArrayList<>();
            for (Member m : model.members().values()) if (m.from().equals(node) || m.to().equals(node)) at2.add(m.name());
            warnings.add(new EngineWarning(ILL_CONDITIONED_RULE, String.format(Locale.ROOT, "the stiffness matrix is nearly "
                    + "singular at %s (pivot ratio %.1e, about %d digits lost): a near-mechanism or very unequal stiffnesses; "
                    + "members there: %s", where, k.smallestPivotRatio(), (int) Math.round(-Math.log10(k.smallestPivotRatio())),
                    String.join(", ", at2))));
        }
        Factored kf = new Factored(model, nodes, index, dof, fixed, free, List.copyOf(elements), frameAngle, k, loading, functions);
        last.set(new Reusable(kf, List.copyOf(notes), List.copyOf(warnings)));
        return cases(kf, notes, warnings);
    }

    /**
     * The model with K_ff factored once: the numbering of its freedoms (dof[node][direction]:
     * a free freedom's index, a negative code for a restrained one, Integer.MIN_VALUE where a
     * node has no rotation), its elements and the factorization. Each load case is then a
     * right-hand side: {@link #solve(LoadCase)}.
     */
    private record Factored(Model model, List<Node> nodes, Map<String, Integer> index, int[][] dof, boolean[][] fixed,
                            int free, List<Element> elements, double[] frameAngle, SkylineLdl k,
                            MemberLoading loading, MemberFunctions functions) {

        /** The same factorization for a model of the same structure with other loads. */
        Factored withModel(Model other) {
            return new Factored(other, nodes, index, dof, fixed, free, elements, frameAngle, k, loading, functions);
        }

        Solution solve(LoadCase c) {
            int nn = nodes.size();
            Map<String, MemberActions> actions = loading.of(model, c);
            double[][] load = new double[nn][3];      // applied node loads, node frames
            for (NodeLoad nl : c.nodeLoads()) {
                int n = index.get(nl.node());
                double cs = Math.cos(frameAngle[n]), sn = Math.sin(frameAngle[n]);
                load[n][0] += nl.fxN() * cs + nl.fyN() * sn;
                load[n][1] += -nl.fxN() * sn + nl.fyN() * cs;
                load[n][2] += nl.mzNm();
            }
            double[][] prescribed = new double[nn][3];
            for (Settlement s : c.settlements()) {
                int n = index.get(s.node());
                for (int d = 0; d < 3; d++) if (!Double.isNaN(s.value(d))) prescribed[n][d] = s.value(d);
            }
            Map<Element, double[]> fixedEnd = new HashMap<>();
            double[] rhs = new double[free];
            for (int n = 0; n < nn; n++) for (int d = 0; d < 3; d++) if (dof[n][d] >= 0) rhs[dof[n][d]] += load[n][d];
            for (Element e : elements) {
                MemberActions a = actions.get(e.member.name());
                double[] f0 = a == null ? new double[6] : frame(e, fixedEndForces(e, a));
                fixedEnd.put(e, f0);
                int[] nodesOf = {e.i, e.i, e.i, e.j, e.j, e.j};
                double[] ur = new double[6];
                boolean any = false;
                for (int q = 0; q < 6; q++) {
                    if (e.dofs[q] == Integer.MIN_VALUE || e.dofs[q] >= 0) continue;
                    ur[q] = prescribed[nodesOf[q]][q % 3];
                    any |= ur[q] != 0;
                }
                for (int p = 0; p < 6; p++) {
                    if (e.dofs[p] < 0) continue;
                    double v = -f0[p];
                    if (any) for (int q = 0; q < 6; q++) v -= e.kFrame[p][q] * ur[q];
                    rhs[e.dofs[p]] += v;
                }
            }
            double[] uf = k.solve(rhs);
            double[][] u = new double[nn][3];
            for (int n = 0; n < nn; n++) {
                for (int d = 0; d < 3; d++) {
                    if (dof[n][d] >= 0) u[n][d] = uf[dof[n][d]];
                    else if (dof[n][d] != Integer.MIN_VALUE) u[n][d] = prescribed[n][d];
                }
            }
            // member end forces (local) and the forces members exert back on the supports
            double[][] fromMembers = new double[nn][3];
            Map<String, MemberSolution> members = new LinkedHashMap<>();
            for (Element e : elements) {
                double[] ue = new double[6];
                int[] nodesOf = {e.i, e.i, e.i, e.j, e.j, e.j};
                for (int q = 0; q < 6; q++) ue[q] = u[nodesOf[q]][q % 3];
                double[] f0 = fixedEnd.get(e);
                for (int p = 0; p < 6; p++) {
                    double v = f0[p];
                    for (int q = 0; q < 6; q++) v += e.kFrame[p][q] * ue[q];
                    fromMembers[nodesOf[p]][p % 3] += v;
                }
                double[] local = new double[6];
                double[] uLocal = new double[6];
                for (int p = 0; p < 6; p++) for (int q = 0; q < 6; q++) uLocal[p] += e.t[p][q] * ue[q];
                MemberActions a = actions.get(e.member.name());
                double[] f0Local = a == null ? new double[6] : fixedEndForces(e, a);
                for (int p = 0; p < 6; p++) {
                    double v = f0Local[p];
                    for (int q = 0; q < 6; q++) v += e.kLocal[p][q] * uLocal[q];
                    local[p] = v;
                }
                if (e.member.releasedStart()) local[2] = 0;
                if (e.member.releasedEnd()) local[5] = 0;
                MemberActions acts = a == null ? MemberActions.none(e.lengthM) : a;
                members.put(e.member.name(), functions.solve(local, acts, e.ei, uLocal[1], uLocal[4]));
            }
            Map<String, double[]> reactions = new LinkedHashMap<>();
            for (Support s : model.supports().values()) {
                int n = index.get(s.node());
                double[] r = new double[3];
                for (int d = 0; d < 3; d++) {
                    if (fixed[n][d]) r[d] = fromMembers[n][d] - load[n][d];
                    else if (s.spring(d) > 0) r[d] = -s.spring(d) * u[n][d];
                }
                double cs = Math.cos(frameAngle[n]), sn = Math.sin(frameAngle[n]);
                reactions.put(s.node(), new double[]{r[0] * cs - r[1] * sn, r[0] * sn + r[1] * cs, r[2]});
            }
            Map<String, double[]> disp = new LinkedHashMap<>();
            for (int n = 0; n < nn; n++) {
                double cs = Math.cos(frameAngle[n]), sn = Math.sin(frameAngle[n]);
                disp.put(nodes.get(n).name(), new double[]{u[n][0] * cs - u[n][1] * sn, u[n][0] * sn + u[n][1] * cs, u[n][2]});
            }
            Solution s = new Solution(c.name(), disp, reactions, members, 0);
            double residual = Equilibrium.residual(model, s, Map.of(c.name(), 1.0));
            return new Solution(c.name(), disp, reactions, members, residual);
        }
    }

    private static double[] frame(Element e, double[] local) {
        double[] out = new double[6];
        for (int p = 0; p < 6; p++) for (int q = 0; q < 6; q++) out[p] += e.t[q][p] * local[q];
        return out;
    }

    private static Element element(Model model, Member m, Map<String, Integer> index, int[][] dof, double[] frameAngle) {
        Element e = new Element();
        e.member = m;
        e.i = index.get(m.from());
        e.j = index.get(m.to());
        Node a = model.node(m.from()), b = model.node(m.to());
        e.lengthM = model.lengthM(m);
        e.angle = Math.atan2(b.yM() - a.yM(), b.xM() - a.xM());
        double ea = model.axialStiffnessN(m);
        e.ei = model.bendingStiffnessNm2(m);
        for (int d = 0; d < 3; d++) {
            e.dofs[d] = dof[e.i][d];
            e.dofs[d + 3] = dof[e.j][d];
        }
        e.kLocal = condensed(fullLocal(ea, Double.isFinite(e.ei) && e.ei > 0 ? e.ei : 1.0, e.lengthM), m);
        e.t = new double[6][6];
        double[] ang = {e.angle - frameAngle[e.i], e.angle - frameAngle[e.j]};
        for (int end = 0; end < 2; end++) {
            double c = Math.cos(ang[end]), s = Math.sin(ang[end]);
            int o = 3 * end;
            e.t[o][o] = c;
            e.t[o][o + 1] = s;
            e.t[o + 1][o] = -s;
            e.t[o + 1][o + 1] = c;
            e.t[o + 2][o + 2] = 1;
        }
        e.kFrame = new double[6][6];
        double[][] kt = new double[6][6];
        for (int p = 0; p < 6; p++) for (int q = 0; q < 6; q++) for (int r = 0; r < 6; r++) kt[p][q] += e.kLocal[p][r] * e.t[r][q];
        for (int p = 0; p < 6; p++) for (int q = 0; q < 6; q++) for (int r = 0; r < 6; r++) e.kFrame[p][q] += e.t[r][p] * kt[r][q];
        return e;
    }

    /** Euler-Bernoulli plane frame element in local axes (u1, v1, th1, u2, v2, th2). */
    static double[][] fullLocal(double ea, double ei, double len) {
        double[][] k = new double[6][6];
        double x = ea / len, a = 12 * ei / (len * len * len), b = 6 * ei / (len * len), c = 4 * ei / len, d = 2 * ei / len;
        k[0][0] = x;
        k[0][3] = -x;
        k[3][0] = -x;
        k[3][3] = x;
        double[][] bend = {{a, b, -a, b}, {b, c, -b, d}, {-a, -b, a, -b}, {b, d, -b, c}};
        int[] map = {1, 2, 4, 5};
        for (int p = 0; p < 4; p++) for (int q = 0; q < 4; q++) k[map[p]][map[q]] = bend[p][q];
        return k;
    }

    /** Static condensation of released rotations: k_rr - k_rc k_cc^-1 k_cr (exact, no small stiffness). */
    static double[][] condensed(double[][] k, Member m) {
        List<Integer> rel = new ArrayList<>();
        if (m.releasedStart()) rel.add(2);
        if (m.releasedEnd()) rel.add(5);
        if (rel.isEmpty()) return k;
        double[][] out = new double[6][6];
        int nc = rel.size();
        double[][] kcc = new double[nc][nc];
        for (int p = 0; p < nc; p++) for (int q = 0; q < nc; q++) kcc[p][q] = k[rel.get(p)][rel.get(q)];
        double[][] inv = invert(kcc);
        for (int p = 0; p < 6; p++) {
            for (int q = 0; q < 6; q++) {
                if (rel.contains(p) || rel.contains(q)) continue;
                double v = k[p][q];
                for (int r = 0; r < nc; r++) for (int s = 0; s < nc; s++) v -= k[p][rel.get(r)] * inv[r][s] * k[rel.get(s)][q];
                out[p][q] = v;
            }
        }
        if (nc == 2) {
            // pinned at both ends: no bending stiffness at all (the algebra leaves only rounding)
            for (int p : new int[]{1, 4}) for (int q : new int[]{1, 4}) out[p][q] = 0;
        }
        return out;
    }

    private static double[][] invert(double[][] a) {
        if (a.length == 1) return new double[][]{{1 / a[0][0]}};
        double det = a[0][0] * a[1][1] - a[0][1] * a[1][0];
        return new double[][]{{a[1][1] / det, -a[0][1] / det}, {-a[1][0] / det, a[0][0] / det}};
    }

    /**
     * Fixed-end forces on the member (local, acting on it) for its loads, condensed for its
     * releases: f0 = -(integral of N^T q) for the Hermite (transverse) and linear (axial)
     * shape functions, plus the restrained thermal forces {EA e, 0, EI k, -EA e, 0, -EI k}.
     */
    private static double[] fixedEndForces(Element e, MemberActions a) {
        double len = e.lengthM;
        double[] eq = new double[6];   // equivalent node loads, local
        for (MemberActions.Linear l : a.distributed()) {
            double h = l.bM() - l.aM();
            double[] gx = {-Math.sqrt(0.6), 0, Math.sqrt(0.6)};
            double[] gw = {5.0 / 9, 8.0 / 9, 5.0 / 9};
            for (int g = 0; g < 3; g++) {
                double t = 0.5 * (1 + gx[g]);
                double x = l.aM() + t * h, w = gw[g] * h / 2;
                double p = l.p1() + (l.p2() - l.p1()) * t, q = l.q1() + (l.q2() - l.q1()) * t;
                double[] n = shape(x / len, len);
                eq[0] += w * p * (1 - x / len);
                eq[3] += w * p * (x / len);
                eq[1] += w * q * n[0];
                eq[2] += w * q * n[1];
                eq[4] += w * q * n[2];
                eq[5] += w * q * n[3];
            }
        }
        for (MemberActions.Point p : a.points()) {
            double[] n = shape(p.aM() / len, len);
            eq[0] += p.px() * (1 - p.aM() / len);
            eq[3] += p.px() * (p.aM() / len);
            eq[1] += p.qy() * n[0];
            eq[2] += p.qy() * n[1];
            eq[4] += p.qy() * n[2];
            eq[5] += p.qy() * n[3];
        }
        for (MemberActions.Couple c : a.couples()) {
            double[] dn = shapeSlope(c.aM() / len, len);
            eq[1] += c.mz() * dn[0];
            eq[2] += c.mz() * dn[1];
            eq[4] += c.mz() * dn[2];
            eq[5] += c.mz() * dn[3];
        }
        double[] f0 = new double[6];
        for (int p = 0; p < 6; p++) f0[p] = -eq[p];
        double ea = e.kLocal[0][0] * len;
        double ei = Double.isFinite(e.ei) ? e.ei : 0;
        f0[0] += ea * a.thermalStrain();
        f0[3] -= ea * a.thermalStrain();
        f0[2] += ei * a.thermalCurvaturePerM();
        f0[5] -= ei * a.thermalCurvaturePerM();
        return condensedLoad(f0, e);
    }

    /** f0_r - k_rc k_cc^-1 f0_c, with the full (uncondensed) element stiffness. */
    private static double[] condensedLoad(double[] f0, Element e) {
        Member m = e.member;
        if (!m.releasedStart() && !m.releasedEnd()) return f0;
        double ei = Double.isFinite(e.ei) && e.ei > 0 ? e.ei : 1.0;
        double[][] k = fullLocal(e.kLocal[0][0] * e.lengthM, ei, e.lengthM);
        List<Integer> rel = new ArrayList<>();
        if (m.releasedStart()) rel.add(2);
        if (m.releasedEnd()) rel.add(5);
        int nc = rel.size();
        double[][] kcc = new double[nc][nc];
        for (int p = 0; p < nc; p++) for (int q = 0; q < nc; q++) kcc[p][q] = k[rel.get(p)][rel.get(q)];
        double[][] inv = invert(kcc);
        double[] out = new double[6];
        for (int p = 0; p < 6; p++) {
            if (rel.contains(p)) continue;
            double v = f0[p];
            for (int r = 0; r < nc; r++) for (int s = 0; s < nc; s++) v -= k[p][rel.get(r)] * inv[r][s] * f0[rel.get(s)];
            out[p] = v;
        }
        return out;
    }

    /** Hermite cubic shape functions {N_v1, N_th1, N_v2, N_th2} at xi = x/L. */
    private static double[] shape(double xi, double len) {
        double x2 = xi * xi, x3 = x2 * xi;
        return new double[]{1 - 3 * x2 + 2 * x3, len * (xi - 2 * x2 + x3), 3 * x2 - 2 * x3, len * (-x2 + x3)};
    }

    /** d/dx of the Hermite shape functions at xi = x/L. */
    private static double[] shapeSlope(double xi, double len) {
        double x2 = xi * xi;
        return new double[]{(-6 * xi + 6 * x2) / len, 1 - 4 * xi + 3 * x2, (6 * xi - 6 * x2) / len, -2 * xi + 3 * x2};
    }
}
