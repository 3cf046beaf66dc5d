package plumbline.review;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import plumbline.Models;
import plumbline.model.LoadCase;
import plumbline.model.MemberLoad;
import plumbline.model.Model;
import plumbline.solve.Engine;
import plumbline.solve.EngineResult;
import plumbline.solve.Equilibrium;
import plumbline.solve.MemberActions;
import plumbline.solve.MemberFunctions;
import plumbline.solve.MemberLoading;
import plumbline.solve.MemberSolution;
import plumbline.solve.Solution;
import plumbline.solve.force.ForceEngine;
import plumbline.solve.stiffness.StiffnessEngine;

/**
 * The tool's own safeguards, broken on purpose through the engines' seams: a slip planted in
 * the member loads both engines share must show as an equilibrium failure, a slip planted in
 * one engine's member functions or results as a disagreement, and either must change the
 * verdict (exit 1) before anything is said about the claims. The correct engines on the same
 * models must pass, so each test shows the safeguard can both hold and fail.
 */
class SafeguardTest {

    /**
     * An inclined simple beam under a vertical point load (statics by hand, as
     * checks/28-inclined-beam-vertical-point.yaml: N = -3 then +3 kN, M_max = 10 kN*m),
     * a sloped rafter with snow per plan, a hinged beam beyond it, and a claim that is right.
     */
    static final Model MODEL = Models.yaml(Models.HEAD + """
            nodes: {A: [0, 0], B: [4, 3], C: [8, 3]}
            supports: {A: pinned, B: roller, C: roller}
            members:
              M1: {from: A, to: B, section: G}
              M2: {from: B, to: C, section: G, hinge: start}
            loads:
              P: {type: dead, member_loads: [{member: M1, P: -10, at: 2.5}, {member: M2, P: -4, at: 1}]}
              S: {type: snow, member_loads: [{member: M1, w: 2, dir: gravity, per: plan}]}
            combinations:
              ULS: {P: 1.35, S: 1.5}
            claims:
              members:
                - {member: M1, combo: P, M_max: 10}
            """);

    static Review review(Engine... engines) {
        return Review.of(Analysis.of(MODEL, List.of(engines)), TolerancePolicy.none());
    }

    /** The shared loads with the axial component of every point force reversed. */
    static final MemberLoading AXIAL_POINT_SIGN_SLIP = (model, c) -> {
        Map<String, MemberActions> out = new LinkedHashMap<>();
        MemberActions.of(model, c).forEach((k, a) -> out.put(k, new MemberActions(a.lengthM(), a.distributed(),
                a.points().stream().map(p -> new MemberActions.Point(p.aM(), -p.px(), p.qy())).toList(), a.couples(),
                a.thermalStrain(), a.thermalCurvaturePerM())));
        return out;
    };

    /** The shared loads reading a per-plan intensity as per member length (the plan scaling lost). */
    static final MemberLoading PER_PLAN_SLIP = (model, c) -> {
        List<MemberLoad> asPerLength = c.memberLoads().stream().map(l -> l instanceof MemberLoad.Distributed w && w.perPlan()
                ? new MemberLoad.Distributed(w.member(), w.dir(), false, w.fromM(), w.toM(), w.w1NPerM(), w.w2NPerM(), w.at())
                : l).toList();
        return MemberActions.of(model, new LoadCase(c.name(), c.type(), c.selfWeight(), c.pattern(), asPerLength, c.nodeLoads(),
                c.temperatures(), c.settlements(), c.at()));
    };

    /** Shared loads scaled by 1.01 (a factor slip of one per cent). */
    static final MemberLoading SCALE_SLIP = (model, c) -> {
        Map<String, MemberActions> out = new LinkedHashMap<>();
        MemberActions.of(model, c).forEach((k, a) -> out.put(k, new MemberActions.Sum(a.lengthM()).add(a, 1.01).result()));
        return out;
    };

    @Test
    void correctEnginesPassBothSafeguards() {
        Review r = review(new StiffnessEngine(), new ForceEngine());
        assertTrue(r.safeguards().balanced(), "residual " + r.safeguards().worstResidual());
        assertTrue(r.safeguards().enginesAgree(), "agreement " + r.safeguards().agreement());
        assertTrue(r.safeguards().agreement() < 1e-9, "agreement " + r.safeguards().agreement());
        assertEquals(Verdict.OK, r.verdict());
        assertFalse(r.verdict().flagged);
    }

    @Test
    void axialSignSlipInSharedLoadsUnbalancesBothEngines() {
        Review r = review(new StiffnessEngine(AXIAL_POINT_SIGN_SLIP, MemberFunctions.SHARED),
                new ForceEngine(AXIAL_POINT_SIGN_SLIP, new ForceEngine().memberFunctions()));
        // both engines solve the same wrong loads alike, so they agree: only equilibrium can see it
        assertTrue(r.safeguards().enginesAgree(), "agreement " + r.safeguards().agreement());
        assertFalse(r.safeguards().balanced());
        assertTrue(r.safeguards().worstResidual() > 0.1, "residual " + r.safeguards().worstResidual());
        assertEquals(Verdict.UNBALANCED, r.verdict());
        assertTrue(r.verdict().flagged);
    }

    @Test
    void perPlanSlipInSharedLoadsUnbalances() {
        Review r = review(new StiffnessEngine(PER_PLAN_SLIP, MemberFunctions.SHARED));
        // the rafter's plan length is 0.8 of its length: per length carries 1/0.8 times the snow
        assertTrue(r.safeguards().worstResidual() > 0.05, "residual " + r.safeguards().worstResidual());
        assertTrue(r.safeguards().worstResidualAt().contains("S") || r.safeguards().worstResidualAt().contains("ULS"),
                r.safeguards().worstResidualAt());
        assertEquals(Verdict.UNBALANCED, r.verdict());
    }

    @Test
    void onePercentLoadSlipIsFarAboveTheEquilibriumTolerance() {
        Review r = review(new StiffnessEngine(SCALE_SLIP, MemberFunctions.SHARED));
        assertTrue(r.safeguards().worstResidual() > 1e3 * Equilibrium.TOLERANCE, "residual " + r.safeguards().worstResidual());
        assertEquals(Verdict.UNBALANCED, r.verdict());
    }

    @Test
    void slipInOneEnginesMemberFunctionsMakesThemDisagree() {
        // the stiffness method's member functions take EI 5% too stiff: end forces, loads and equilibrium
        // stay right, the deflections along the members do not
        MemberFunctions stiff = (f, a, ei, vs, ve) -> MemberFunctions.SHARED.solve(f, a, ei * 1.05, vs, ve);
        Review r = review(new StiffnessEngine(MemberLoading.SHARED, stiff), new ForceEngine());
        assertTrue(r.safeguards().balanced(), "residual " + r.safeguards().worstResidual());
        assertFalse(r.safeguards().enginesAgree());
        assertEquals(Verdict.ENGINES_DISAGREE, r.verdict());
        assertTrue(r.verdict().flagged);
    }

    @Test
    void loadsMovedInsideOneEnginesMemberFunctionsAreSeenByBothSafeguards() {
        // the stiffness method's member functions see every point load 5% further along the member: the
        // peaks differ from the force method's, and the loads the functions carry no longer have the
        // moment of the model's loads about the member's start
        MemberFunctions shifted = (f, a, ei, vs, ve) -> MemberFunctions.SHARED.solve(f, new MemberActions(a.lengthM(),
                a.distributed(), a.points().stream().map(p -> new MemberActions.Point(Math.min(a.lengthM(), p.aM() * 1.05), p.px(),
                p.qy())).toList(), a.couples(), a.thermalStrain(), a.thermalCurvaturePerM()), ei, vs, ve);
        Review r = review(new StiffnessEngine(MemberLoading.SHARED, shifted), new ForceEngine());
        assertFalse(r.safeguards().enginesAgree());
        assertFalse(r.safeguards().balanced(), "residual " + r.safeguards().worstResidual());
        assertEquals(Verdict.ENGINES_DISAGREE, r.verdict(), "a disagreement of the engines ranks above an imbalance");
    }

    @Test
    void slipInTheForceMethodsOwnMemberFunctionsMakesThemDisagree() {
        // the force method's peaks taken from functions of a member 1% shorter than it is
        MemberFunctions shortened = (f, a, ei, vs, ve) -> {
            return MemberSolution.withPeaks(f, a, ei, vs, ve, MemberSolution.of(f, new MemberActions(a.lengthM() * 0.99,
                    a.distributed(), a.points(), a.couples(), a.thermalStrain(), a.thermalCurvaturePerM()), ei, vs, ve).peaks());
        };
        Review r = review(new StiffnessEngine(), new ForceEngine(MemberLoading.SHARED, shortened));
        assertFalse(r.safeguards().enginesAgree(), "agreement " + r.safeguards().agreement());
        assertEquals(Verdict.ENGINES_DISAGREE, r.verdict());
    }

    /** An engine whose reactions are off by 3e-3, as a planted slip in one method would leave them. */
    static Engine perturbed(Engine inner, double factor) {
        return new Engine() {
            public String name() {
                return inner.name();
            }

            public MemberFunctions memberFunctions() {
                return inner.memberFunctions();
            }

            public EngineResult solve(Model model) {
                EngineResult r = inner.solve(model);
                Map<String, Solution> cases = new LinkedHashMap<>();
                r.cases().forEach((k, s) -> {
                    Map<String, double[]> reactions = new LinkedHashMap<>();
                    s.reactions().forEach((n, v) -> reactions.put(n, new double[]{v[0] * factor, v[1] * factor, v[2] * factor}));
                    cases.put(k, new Solution(s.name(), s.displacements(), reactions, s.members(), s.equilibriumResidual()));
                });
                return new EngineResult(r.engine(), r.stable(), r.instability(), cases, r.notes(), r.warnings(), r.declined(), r.working());
            }
        };
    }

    @Test
    void disagreementOfThreePerThousandChangesTheVerdictAndComesFirst() {
        Review r = review(new StiffnessEngine(), perturbed(new ForceEngine(), 1 + 3e-3));
        assertNotNull(r.safeguards().agreement());
        assertEquals(3e-3, r.safeguards().agreement(), 1e-4);
        assertEquals(Verdict.ENGINES_DISAGREE, r.verdict());
        String console = plumbline.report.Console.summary(r, "stiffness and force methods", r.safeguards().agreement());
        assertTrue(console.lines().skip(1).findFirst().orElse("").startsWith("VERDICT ENGINES-DISAGREE"), console);
        assertTrue(console.contains("Engines DISAGREE"), console);
    }

    @Test
    void aDifferenceJustAboveTheToleranceFlagsAndJustBelowDoesNot() {
        Review above = review(new StiffnessEngine(), perturbed(new ForceEngine(), 1 + 3 * Agreement.TOLERANCE));
        assertEquals(Verdict.ENGINES_DISAGREE, above.verdict());
        Review below = review(new StiffnessEngine(), perturbed(new ForceEngine(), 1 + 0.3 * Agreement.TOLERANCE));
        assertEquals(Verdict.OK, below.verdict());
    }

    @Test
    void noClaimsIsNeverOk() {
        Model bare = Models.yaml(Models.SIMPLE_BEAM + """
                loads: {D: {type: dead, member_loads: [{member: M1, w: -10}]}}
                """);
        Review r = Review.of(Analysis.of(bare, List.of(new StiffnessEngine(), new ForceEngine())), TolerancePolicy.none());
        assertEquals(Verdict.NO_CLAIMS, r.verdict());
        assertFalse(r.verdict().flagged, "exit 0: a solve is not a failure (format reference (src/site/markdown/formats.md) section 6)");
        String console = plumbline.report.Console.summary(r, "both", r.safeguards().agreement());
        assertTrue(console.contains("Verdict: NO-CLAIMS"), console);
        assertFalse(console.contains("Verdict: OK"), console);
    }

    @Test
    void verdictOrderPutsTheSafeguardsBeforeTheClaims() {
        Review.Safeguards good = new Review.Safeguards(1e-12, 1e-14, "");
        Review.Safeguards disagree = new Review.Safeguards(1e-3, 1e-14, "");
        Review.Safeguards unbalanced = new Review.Safeguards(1e-12, 1e-3, "x");
        Review.Safeguards oneEngine = new Review.Safeguards(null, 1e-14, "");
        Review ok = review(new StiffnessEngine());
        List<ClaimResult> none = List.of(), fine = ok.claims();
        assertEquals(Verdict.UNSTABLE, Review.verdict(false, disagree, fine, true));
        assertEquals(Verdict.ENGINES_DISAGREE, Review.verdict(true, disagree, fine, true));
        assertEquals(Verdict.ENGINES_DISAGREE, Review.verdict(true, new Review.Safeguards(1e-3, 1e-3, ""), none, true));
        assertEquals(Verdict.UNBALANCED, Review.verdict(true, unbalanced, fine, true));
        assertEquals(Verdict.MARGINAL, Review.verdict(true, good, fine, false), "claimed reactions out of balance");
        assertEquals(Verdict.NO_CLAIMS, Review.verdict(true, good, none, true));
        assertEquals(Verdict.OK, Review.verdict(true, good, fine, true));
        assertEquals(Verdict.OK, Review.verdict(true, oneEngine, fine, true));
        assertTrue(oneEngine.enginesAgree(), "one engine alone has nothing to disagree with");
        assertTrue(new Review.Safeguards(Agreement.TOLERANCE, Equilibrium.TOLERANCE, "").enginesAgree());
        assertTrue(new Review.Safeguards(Agreement.TOLERANCE, Equilibrium.TOLERANCE, "").balanced());
        assertFalse(new Review.Safeguards(Math.nextUp(Agreement.TOLERANCE), 0, "").enginesAgree());
        assertFalse(new Review.Safeguards(0.0, Math.nextUp(Equilibrium.TOLERANCE), "").balanced());
        assertFalse(new Review.Safeguards(0.0, Double.NaN, "").balanced(), "a NaN residual is not balance");
    }
}
