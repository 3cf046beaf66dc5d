package plumbline.cli;

/** Which engines fill the results: the stiffness method, the force method, or both (their agreement then reported). */
enum Method {
    stiffness, force, both
}
