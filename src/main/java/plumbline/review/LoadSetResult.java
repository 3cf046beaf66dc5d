package plumbline.review;

import plumbline.model.Quantity;

import java.util.ArrayList;
import java.util.List;
import plumbline.solve.Envelope;
import plumbline.solve.MemberResponse;
import plumbline.solve.Peaks;
import plumbline.solve.Piecewise;
import plumbline.solve.Solution;

/**
 * The computed results of one load set, in SI: a single solved state, or, when the set
 * holds a pattern-loaded case, the exact envelope over every on/off arrangement of that
 * case's member loads (member by member), formed by superposition of per-member
 * solutions. A reaction or displacement then has an upper and a lower value; a member
 * peak is the envelope's, with the members loaded to produce it.
 */
public sealed interface LoadSetResult {

    String name();

    /** True when the values are an envelope over pattern arrangements. */
    boolean patterned();

    /** Reaction component (0 Fx, 1 Fy, 2 Mz); for an envelope its upper or lower value. */
    double reaction(String node, int component, boolean upper);

    double displacement(String node, int component, boolean upper);

    Peak peak(String member, Quantity quantity);

    /** The member's peaks of these quantities, in their order (as {@link #peak} of each). */
    default Peak[] peaks(String member, List<Quantity> quantities) {
        Peak[] out = new Peak[quantities.size()];
        for (int i = 0; i < out.length; i++) out[i] = peak(member, quantities.get(i));
        return out;
    }

    /**
     * The member's peaks of these quantities written into {@code values} (SI) and {@code placesM}
     * (m from its start), in their order, as {@link #peak} of each: for a writer of every member,
     * which fills the same two arrays member after member instead of taking objects for each.
     */
    default void peaks(String member, List<Quantity> quantities, double[] values, double[] placesM) {
        for (int i = 0; i < quantities.size(); i++) {
            Peak p = peak(member, quantities.get(i));
            values[i] = p.value();
            placesM[i] = p.xM();
        }
    }

    /**
     * A member function's value at {@code xM} from the start (the value just left of it when
     * {@code fromLeft}, as at the member's end); for an envelope its upper or lower value.
     */
    double valueAt(String member, Quantity.Function f, double xM, boolean fromLeft, boolean upper);

    /** The worst equilibrium residual of the states the set is made of (NaN, if any, is the worst). */
    default double equilibriumResidual() {
        return solutions().stream().mapToDouble(Solution::equilibriumResidual).max().orElse(0);
    }

    /** The state drawn and listed for the set: the solution itself, or every patterned load on. */
    Solution representative();

    /** Every solved state the set is made of (the one state, or the fixed part, each pattern part and all on). */
    List<Solution> solutions();

    /** A member peak, where it occurs, and (for an envelope) the members whose loads are on. */
    record Peak(double value, double xM, List<String> loadedMembers) {
    }

    record Plain(Solution solution) implements LoadSetResult {
        public String name() {
            return solution.name();
        }

        public boolean patterned() {
            return false;
        }

        public double reaction(String node, int component, boolean upper) {
            double[] r = solution.reactions().get(node);
            return r == null ? 0.0 : r[component];
        }

        public double displacement(String node, int component, boolean upper) {
            return solution.displacements().get(node)[component];
        }

        public Peak peak(String member, Quantity quantity) {
            return peak(solution.members().get(member).peaks(), quantity);
        }

        /** The member looked up once for all the quantities (the results list every peak of every member). */
        @Override
        public Peak[] peaks(String member, List<Quantity> quantities) {
            Peaks p = solution.members().get(member).peaks();
            Peak[] out = new Peak[quantities.size()];
            for (int i = 0; i < out.length; i++) out[i] = peak(p, quantities.get(i));
            return out;
        }

        @Override
        public void peaks(String member, List<Quantity> quantities, double[] values, double[] placesM) {
            Peaks p = solution.members().get(member).peaks();
            for (int i = 0; i < quantities.size(); i++) {
                Quantity q = quantities.get(i);
                values[i] = p.value(q);
                placesM[i] = p.position(q);
            }
        }

        private static Peak peak(Peaks p, Quantity quantity) {
            return new Peak(p.value(quantity), p.position(quantity), List.of());
        }

        public double valueAt(String member, Quantity.Function f, double xM, boolean fromLeft, boolean upper) {
            Piecewise p = Pattern.function(solution.members().get(member).response(), f);
            return fromLeft ? p.atLeft(xM) : p.at(xM);
        }

        public List<Solution> solutions() {
            return List.of(solution);
        }

        public Solution representative() {
            return solution;
        }
    }

    /** One arrangement unit: the loads on one member of a pattern case, factored. */
    record Part(String loadedMember, Solution solution) {
    }

    record Pattern(String name, Solution fixed, List<Part> parts, Solution allOn) implements LoadSetResult {
        public Pattern {
            parts = List.copyOf(parts);
        }

        public boolean patterned() {
            return true;
        }

        public double reaction(String node, int c, boolean upper) {
            double v = value(fixed.reactions().get(node), c);
            for (Part p : parts) {
                double q = value(p.solution().reactions().get(node), c);
                v += upper ? Math.max(0, q) : Math.min(0, q);
            }
            return v;
        }

        public double displacement(String node, int c, boolean upper) {
            double v = fixed.displacements().get(node)[c];
            for (Part p : parts) {
                double q = p.solution().displacements().get(node)[c];
                v += upper ? Math.max(0, q) : Math.min(0, q);
            }
            return v;
        }

        private static double value(double[] r, int c) {
            return r == null ? 0.0 : r[c];
        }

        public Peak peak(String member, Quantity quantity) {
            MemberResponse fixedPart = fixed.members().get(member).response();
            Piecewise base = function(fixedPart, quantity.function);
            List<Piecewise> ps = functions(member, quantity.function);
            Envelope.Extreme hi = Envelope.max(base, ps), lo = Envelope.min(base, ps);
            return switch (quantity.extreme) {
                case MAX -> peak(hi);
                case MIN -> peak(lo);
                // the larger magnitude (the deflection is always one), reported as a magnitude
                case ABS -> Math.abs(lo.value()) > Math.abs(hi.value())
                        ? peak(new Envelope.Extreme(Math.abs(lo.value()), lo.xM(), lo.partsOn()))
                        : peak(new Envelope.Extreme(Math.abs(hi.value()), hi.xM(), hi.partsOn()));
            };
        }

        public double valueAt(String member, Quantity.Function f, double xM, boolean fromLeft, boolean upper) {
            double v = at(function(fixed.members().get(member).response(), f), xM, fromLeft);
            for (Part p : parts) {
                double q = at(function(p.solution().members().get(member).response(), f), xM, fromLeft);
                v += upper ? Math.max(0, q) : Math.min(0, q); // each span on only where it adds to the side sought
            }
            return v;
        }

        private static double at(Piecewise p, double xM, boolean fromLeft) {
            return fromLeft ? p.atLeft(xM) : p.at(xM);
        }

        private Peak peak(Envelope.Extreme e) {
            List<String> on = new ArrayList<>();
            for (int k : e.partsOn()) on.add(parts.get(k).loadedMember());
            return new Peak(e.value(), e.xM(), on);
        }

        private List<Piecewise> functions(String member, Quantity.Function f) {
            List<Piecewise> out = new ArrayList<>();
            for (Part p : parts) out.add(function(p.solution().members().get(member).response(), f));
            return out;
        }

        static Piecewise function(MemberResponse r, Quantity.Function f) {
            return switch (f) {
                case N -> r.axial();
                case V -> r.shear();
                case M -> r.moment();
                case DEFLECTION -> r.deflection();
            };
        }

        public List<Solution> solutions() {
            List<Solution> out = new ArrayList<>();
            out.add(fixed);
            for (Part p : parts) out.add(p.solution());
            out.add(allOn);
            return out;
        }

        public Solution representative() {
            return allOn;
        }
    }
}
