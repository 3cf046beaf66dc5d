package plumbline.review;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.function.UnaryOperator;
import org.junit.jupiter.api.Test;
import plumbline.Models;
import plumbline.model.Model;
import plumbline.solve.MemberSolution;
import plumbline.solve.Peaks;
import plumbline.solve.Piecewise;
import plumbline.solve.Solution;
import plumbline.solve.stiffness.StiffnessEngine;

/**
 * The agreement figure itself: a known difference planted in one component of one
 * solution must come out as that difference over the largest value of its kind. The
 * model is a propped cantilever, L = 6 m in two members, w = 10 kN/m, EI = 20000 kN*m2:
 * R_A = 5wL/8 = 37.5 kN, R_B = 3wL/8 = 22.5 kN, M_A = wL^2/8 = 45 kN*m (AISC Manual Table
 * 3-23 case 12, from memory), so the largest force is 37.5 kN and the largest moment 45 kN*m.
 */
class AgreementFigureTest {

    static final Model MODEL = Models.yaml(Models.HEAD + """
            nodes: {A: [0, 0], C: [3, 0], B: [6, 0]}
            supports: {A: fixed, B: roller}
            members: {M1: {from: A, to: C, section: G}, M2: {from: C, to: B, section: G}}
            loads: {W: {type: dead, member_loads: [{members: [M1, M2], w: -10}]}}
            """);
    static final Solution BASE = new StiffnessEngine().solve(MODEL).cases().get("W");
    static final double FORCE = 37.5e3, MOMENT = 45e3;

    static double figure(Solution changed) {
        return Agreement.maxRelativeDifference(MODEL, Map.of("W", BASE), Map.of("W", changed));
    }

    /**
     * v changed by |delta|, towards zero where v is not zero: the largest magnitude of its kind
     * (the figure's scale) is then not raised by the planted difference.
     */
    static double towardZero(double v, double delta) {
        return v == 0 ? Math.abs(delta) : v - Math.signum(v) * Math.abs(delta);
    }

    static Solution withReaction(String node, int k, double delta) {
        Map<String, double[]> r = new LinkedHashMap<>();
        BASE.reactions().forEach((n, v) -> r.put(n, v.clone()));
        r.get(node)[k] = towardZero(r.get(node)[k], delta);
        return new Solution("W", BASE.displacements(), r, BASE.members(), 0);
    }

    static Solution withDisplacement(String node, int k, double delta) {
        Map<String, double[]> d = new LinkedHashMap<>();
        BASE.displacements().forEach((n, v) -> d.put(n, v.clone()));
        d.get(node)[k] = towardZero(d.get(node)[k], delta);
        return new Solution("W", d, BASE.reactions(), BASE.members(), 0);
    }

    static Solution withMember(String member, UnaryOperator<MemberSolution> change) {
        Map<String, MemberSolution> m = new LinkedHashMap<>(BASE.members());
        m.put(member, change.apply(m.get(member)));
        return new Solution("W", BASE.displacements(), BASE.reactions(), m, 0);
    }

    static MemberSolution endForce(MemberSolution s, int k, double delta) {
        double[] f = s.endForcesLocal();
        f[k] = towardZero(f[k], delta);
        return new MemberSolution(f, s.vStartM(), s.vEndM(), s.actions(), s.response(), s.peaks());
    }

    static MemberSolution peak(MemberSolution s, int which, double delta) {
        Piecewise.Extreme[] e = {s.peaks().nMax(), s.peaks().nMin(), s.peaks().vMax(), s.peaks().vMin(), s.peaks().mMax(),
                s.peaks().mMin(), s.peaks().deflection()};
        e[which] = new Piecewise.Extreme(towardZero(e[which].value(), delta), e[which].xM());
        return new MemberSolution(s.endForcesLocal(), s.vStartM(), s.vEndM(), s.actions(), s.response(),
                new Peaks(e[0], e[1], e[2], e[3], e[4], e[5], e[6]));
    }

    @Test
    void theSameSolutionAgreesExactly() {
        assertEquals(0.0, figure(BASE));
    }

    @Test
    void reactionsAreJudgedAgainstTheLargestForceAndMoment() {
        assertEquals(BASE.reactions().get("A")[1], FORCE, 1e-6, "R_A by hand");
        assertEquals(BASE.reactions().get("A")[2], MOMENT, 1e-6, "M_A by hand (counter-clockwise on the structure)");
        assertEquals(0.01, figure(withReaction("B", 1, 0.01 * FORCE)), 1e-9);
        assertEquals(0.02, figure(withReaction("A", 0, -0.02 * FORCE)), 1e-9, "Fx too");
        assertEquals(0.03, figure(withReaction("A", 2, 0.03 * MOMENT)), 1e-9);
    }

    @Test
    void memberEndForcesAndPeaksAreJudgedByKind() {
        assertEquals(0.04, figure(withMember("M2", s -> endForce(s, 4, 0.04 * FORCE))), 1e-9, "fy_j");
        assertEquals(0.05, figure(withMember("M1", s -> endForce(s, 0, 0.05 * FORCE))), 1e-9, "fx_i");
        assertEquals(0.06, figure(withMember("M1", s -> endForce(s, 2, 0.06 * MOMENT))), 1e-9, "m_i");
        assertEquals(0.07, figure(withMember("M1", s -> peak(s, 4, 0.07 * MOMENT))), 1e-9, "M_max");
        assertEquals(0.08, figure(withMember("M2", s -> peak(s, 5, -0.08 * MOMENT))), 1e-9, "M_min");
        assertEquals(0.09, figure(withMember("M2", s -> peak(s, 2, 0.09 * FORCE))), 1e-9, "V_max");
        assertEquals(0.11, figure(withMember("M1", s -> peak(s, 3, 0.11 * FORCE))), 1e-9, "V_min");
        assertEquals(0.12, figure(withMember("M1", s -> peak(s, 0, 0.12 * FORCE))), 1e-9, "N_max");
        assertEquals(0.13, figure(withMember("M1", s -> peak(s, 1, -0.13 * FORCE))), 1e-9, "N_min");
    }

    @Test
    void translationsAreJudgedAgainstTheMembersElasticDeformations() {
        // |M| L^2 / EI of a 3 m member with M_abs = 45 kN*m: 45e3 x 9 / 2e7 = 0.02025 m, more than any
        // displacement or deflection of this beam (N = 0), so it is the scale of translations
        double translation = MOMENT * 9 / 2e7;
        assertEquals(0.01, figure(withDisplacement("C", 1, 0.01 * translation)), 1e-9, "uy");
        assertEquals(0.02, figure(withDisplacement("C", 0, 0.02 * translation)), 1e-9, "ux");
        assertEquals(0.03, figure(withMember("M2", s -> peak(s, 6, 0.03 * translation))), 1e-9, "deflection");
        // rotations: the larger of the largest rotation and translations over the extent (6 m)
        double rz = 0;
        for (double[] d : BASE.displacements().values()) rz = Math.max(rz, Math.abs(d[2]));
        double rotation = Math.max(rz, translation / 6);
        assertEquals(0.04, figure(withDisplacement("B", 2, 0.04 * rotation)), 1e-9, "rz");
    }

    @Test
    void theWorstOverEveryLoadSetAndComponentIsReported() {
        Solution twoSlips = withReaction("B", 1, 0.01 * FORCE);
        Map<String, double[]> r = new LinkedHashMap<>(twoSlips.reactions());
        r.put("A", new double[]{r.get("A")[0], r.get("A")[1] - 0.05 * FORCE, r.get("A")[2]});
        Solution both = new Solution("W", BASE.displacements(), r, BASE.members(), 0);
        assertEquals(0.05, figure(both), 1e-9);
        Map<String, Solution> a = Map.of("W", BASE, "X", BASE), b = Map.of("W", BASE, "X", withReaction("A", 1, 0.2 * FORCE));
        assertEquals(0.2, Agreement.maxRelativeDifference(MODEL, a, b), 1e-9, "the second load set's difference");
        // load sets read side by side (a large model's way) or one after another: the same figure to the bit,
        // the worst set found wherever it stands, and the scale the largest over all sets
        for (boolean sideBySide : new boolean[]{true, false}) {
            Map<String, Solution> many = new LinkedHashMap<>(), slipped = new LinkedHashMap<>();
            for (int k = 0; k < 9; k++) {
                many.put("S" + k, BASE);
                slipped.put("S" + k, k == 6 ? withReaction("A", 1, 0.2 * FORCE) : k == 2 ? withReaction("B", 1, 0.03 * FORCE) : BASE);
            }
            assertEquals(0.2, Agreement.maxRelativeDifference(MODEL, many, slipped, sideBySide), 1e-9, "side by side: " + sideBySide);
            assertEquals(Agreement.maxRelativeDifference(MODEL, many, slipped, !sideBySide),
                    Agreement.maxRelativeDifference(MODEL, many, slipped, sideBySide), 0.0);
            // a set whose reactions are twice as large raises every set's force scale: 7.5 kN against 75 kN
            Map<String, double[]> twice = new LinkedHashMap<>();
            BASE.reactions().forEach((n, v) -> twice.put(n, new double[]{2 * v[0], 2 * v[1], v[2]}));
            Solution large = new Solution("W", BASE.displacements(), twice, BASE.members(), 0);
            many.put("S8", large);
            slipped.put("S8", large);
            assertEquals(0.1, Agreement.maxRelativeDifference(MODEL, many, slipped, sideBySide), 1e-9, "scale over all sets");
        }
        // the scale is the largest of either solution: a doubled reaction is judged against the doubled value
        Map<String, double[]> doubled = new LinkedHashMap<>(BASE.reactions());
        doubled.put("A", new double[]{0, 2 * FORCE, BASE.reactions().get("A")[2]});
        assertEquals(0.5, figure(new Solution("W", BASE.displacements(), doubled, BASE.members(), 0)), 1e-9, "37.5 kN against 75 kN");
    }

    @Test
    void whereNothingIsStrainedTheFloorsComeFromTheRigidMotion() {
        // a simple beam (EA = 200 GPa x 0.01 m2 = 2e9 N, L = 6 m) whose roller settles 10 mm: it turns as a rigid
        // body, so every force is rounding. Forces are then judged against 1e-5 EA u / L = 1e-5 x 2e9 x 0.01 / 6 =
        // 33.33 N, moments against 1e-5 EA u = 200 N*m, translations against u = 0.01 m, rotations against u / L
        Model m = Models.yaml(Models.SIMPLE_BEAM + """
                loads: {S: {type: settlement, settlements: [{node: B, uy: -10 mm}]}}
                """);
        Solution base = new StiffnessEngine().solve(m).cases().get("S");
        java.util.function.Function<Solution, Double> fig = x -> Agreement.maxRelativeDifference(m, Map.of("S", base), Map.of("S", x));
        MemberSolution ms = base.members().get("M1");
        double[] f = ms.endForcesLocal();
        f[4] += 1.0;
        Solution force = new Solution("S", base.displacements(), base.reactions(),
                Map.of("M1", new MemberSolution(f, ms.vStartM(), ms.vEndM(), ms.actions(), ms.response(), ms.peaks())), 0);
        assertEquals(1.0 / (1e-5 * 2e9 * 0.01 / 6), fig.apply(force), 1e-6, "1 N against 33.33 N");
        double[] g = ms.endForcesLocal();
        g[2] += 2.0;
        Solution moment = new Solution("S", base.displacements(), base.reactions(),
                Map.of("M1", new MemberSolution(g, ms.vStartM(), ms.vEndM(), ms.actions(), ms.response(), ms.peaks())), 0);
        assertEquals(2.0 / (1e-5 * 2e9 * 0.01), fig.apply(moment), 1e-6, "2 N*m against 200 N*m");
        Map<String, double[]> d = new LinkedHashMap<>();
        base.displacements().forEach((n, v) -> d.put(n, v.clone()));
        d.get("A")[0] += 1e-4;
        assertEquals(0.01, fig.apply(new Solution("S", d, base.reactions(), base.members(), 0)), 1e-6, "0.1 mm against 10 mm");
        Map<String, double[]> t = new LinkedHashMap<>();
        base.displacements().forEach((n, v) -> t.put(n, v.clone()));
        t.get("A")[2] += 0.01 * (0.01 / 6);
        assertEquals(0.01, fig.apply(new Solution("S", t, base.reactions(), base.members(), 0)), 1e-6, "rotation against u / L");
    }

    @Test
    void aDifferenceWhereNothingActsIsJudgedAgainstItself() {
        // no load, no movement: every scale is the rounding floor, 1e-12 of EA; a planted newton is far beyond it
        Model m = Models.yaml(Models.SIMPLE_BEAM + """
                loads: {Z: {type: dead, node_loads: [{node: B, Fx: 0}]}}
                """);
        Solution base = new StiffnessEngine().solve(m).cases().get("Z");
        Map<String, double[]> r = new LinkedHashMap<>();
        base.reactions().forEach((n, v) -> r.put(n, v.clone()));
        r.get("A")[1] += 1.0;
        double fig = Agreement.maxRelativeDifference(m, Map.of("Z", base), Map.of("Z", new Solution("Z", base.displacements(), r, base.members(), 0)));
        // the force scale is then the planted newton itself (the larger of either solution): 1 N against 1 N
        assertEquals(1.0, fig, 1e-9);
        assertEquals(0.0, Agreement.maxRelativeDifference(m, Map.of("Z", base), Map.of("Z", base)));
    }
}
