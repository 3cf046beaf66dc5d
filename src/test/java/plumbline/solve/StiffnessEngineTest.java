package plumbline.solve;

import plumbline.solve.stiffness.StiffnessEngine;

class StiffnessEngineTest extends EngineContract {
    @Override
    Engine engine() {
        return new StiffnessEngine();
    }
}
