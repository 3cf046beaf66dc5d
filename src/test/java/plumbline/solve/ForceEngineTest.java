package plumbline.solve;

import plumbline.solve.force.ForceEngine;

class ForceEngineTest extends EngineContract {
    @Override
    Engine engine() {
        return new ForceEngine();
    }
}
