package plumbline.solve;

import java.util.ArrayList;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import plumbline.model.Member;
import plumbline.model.Model;

/**
 * Combinations as superpositions of load-case solutions (linear elasticity, small
 * displacements): every displacement, reaction and member end force is the factored sum;
 * member functions are rebuilt from the summed end forces and the factored loads, which is
 * exact because they are linear in both.
 */
public final class Superposition {

    private Superposition() {
    }

    /**
     * @param functions the engine's own member functions, so that the peaks of a combination
     *                  come from the same code as those of its load cases
     */
    public static Solution combine(Model model, String name, Map<Solution, Double> parts, MemberFunctions functions) {
        Map<String, double[]> disp = new LinkedHashMap<>(), reac = new LinkedHashMap<>();
        for (var p : parts.entrySet()) {
            add(disp, p.getKey().displacements(), p.getValue());
            add(reac, p.getKey().reactions(), p.getValue());
        }
        Map<String, MemberSolution> members = new LinkedHashMap<>();
        // each part's members are read in step with the model's (the engines list them in the model's
        // order), looked up by name only where a part's order differs: a lookup in a map of thousands
        // of members costs several cache misses, and a combination makes one per member and part
        List<Map.Entry<Solution, Double>> partList = new ArrayList<>(parts.entrySet());
        List<Iterator<String>> namesInStep = new ArrayList<>();
        List<Iterator<MemberSolution>> inStep = new ArrayList<>();
        for (var p : partList) {
            namesInStep.add(p.getKey().members().keySet().iterator());
            inStep.add(p.getKey().members().values().iterator());
        }
        for (Member m : model.members().values()) {
            double[] f = new double[6];
            double vs = 0, ve = 0;
            MemberActions.Sum a = new MemberActions.Sum(model.lengthM(m));
            for (int q = 0; q < partList.size(); q++) {
                var p = partList.get(q);
                MemberSolution s = Model.inStep(namesInStep.get(q), inStep.get(q), m.name(), p.getKey().members());
                double k = p.getValue();
                for (int i = 0; i < 6; i++) f[i] += k * s.endForceLocal(i);
                vs += k * s.vStartM();
                ve += k * s.vEndM();
                if (k != 0) a.add(s.actions(), k);
            }
            members.put(m.name(), functions.solve(f, a.result(), bendingStiffness(model, m), vs, ve));
        }
        Map<String, Double> factors = new LinkedHashMap<>();
        for (var p : parts.entrySet()) factors.merge(p.getKey().name(), p.getValue(), Double::sum);
        return new Solution(name, disp, reac, members, Equilibrium.residual(model, disp, reac, members, factors));
    }

    private static void add(Map<String, double[]> into, Map<String, double[]> from, double k) {
        for (var e : from.entrySet()) {
            double[] acc = into.computeIfAbsent(e.getKey(), x -> new double[3]);
            for (int i = 0; i < 3; i++) acc[i] += k * e.getValue()[i];
        }
    }

    /** EI of a member in N*m2, NaN when its section gives no I. */
    public static double bendingStiffness(Model model, Member m) {
        return model.bendingStiffnessNm2(m);
    }
}
