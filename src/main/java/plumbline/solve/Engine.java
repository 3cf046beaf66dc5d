package plumbline.solve;

import plumbline.model.Model;

/** An analysis method for plane linear-elastic models. */
public interface Engine {
    /** Short name used in the CLI and reports: stiffness or force. */
    String name();

    /** Solves every load case of the model, unfactored. */
    EngineResult solve(Model model);

    /** How this engine forms member functions and peaks; combinations of its solutions use the same. */
    MemberFunctions memberFunctions();
}
