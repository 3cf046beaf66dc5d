package plumbline.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import plumbline.Models;
import plumbline.model.Model;
import plumbline.solve.stiffness.StiffnessEngine;

class SmokeTest {
    @Test
    void simpleBeamUniformLoad() {
        Model m = Models.yaml("""
                format: plumbline/1
                units: {force: kN, length: m}
                materials: {s: {E: 200 GPa}}
                sections: {G: {A: 0.01, I: 1.0e-4, material: s}}
                nodes: {A: [0, 0], B: [6, 0]}
                supports: {A: pinned, B: roller}
                members: {M1: {from: A, to: B, section: G}}
                loads:
                  D: {type: dead, member_loads: [{member: M1, w: -10}]}
                """);
        EngineResult r = new StiffnessEngine().solve(m);
        Solution s = r.cases().get("D");
        System.out.println(java.util.Arrays.toString(s.reactions().get("A")));
        System.out.println(s.members().get("M1").peaks());
        assertEquals(30e3, s.reactions().get("A")[1], 1e-6);
        assertEquals(45e3, s.members().get("M1").peaks().mMax().value(), 1e-6);
        double defl = 5 * 10e3 * Math.pow(6, 4) / (384 * 200e9 * 1e-4);
        assertEquals(defl, s.members().get("M1").peaks().deflection().value(), 1e-12);
        System.out.println("residual " + s.equilibriumResidual());
    }
}
