package plumbline.run;

/** Which engines fill the results: the stiffness method, the force method, or both (their agreement then reported). */
public enum Method {
    stiffness, force, both
}
