package plumbline.statics;

import java.util.LinkedHashMap;
import java.util.Map;
import plumbline.model.LoadCase;
import plumbline.model.Member;
import plumbline.model.MemberLoad;
import plumbline.model.Model;
import plumbline.model.Node;
import plumbline.model.NodeLoad;

/**
 * Global resultant of the applied loads of a factored set of load cases, worked out here
 * from the model alone (not from either engine, nor from the load description they share):
 * total Fx, Fy (N) and moment (N*m, ccw) about a reference point, and the sum of the
 * magnitudes of all applied forces, the scale against which residuals are judged. The
 * equilibrium check of every solution takes each member's share from
 * {@link #memberResultants}.
 */
public record AppliedLoads(double fxN, double fyN, double momentNm, double magnitudeN) {

    public static AppliedLoads of(Model model, Map<String, Double> factors, double refX, double refY) {
        double fx = 0, fy = 0, mz = 0, mag = 0;
        for (var f : factors.entrySet()) {
            LoadCase c = model.loadCase(f.getKey());
            double k = f.getValue();
            for (NodeLoad nl : c.nodeLoads()) {
                Node n = model.node(nl.node());
                fx += k * nl.fxN();
                fy += k * nl.fyN();
                mz += k * ((n.xM() - refX) * nl.fyN() - (n.yM() - refY) * nl.fxN() + nl.mzNm());
                mag += Math.abs(k) * Math.hypot(nl.fxN(), nl.fyN());
            }
        }
        for (var e : memberResultants(model, factors).entrySet()) {
            Node a = model.node(model.member(e.getKey()).from());
            double[] r = e.getValue();
            fx += r[0];
            fy += r[1];
            // moved from the member's start to the reference point: M_ref = M_start + (start - ref) x F
            mz += r[2] + (a.xM() - refX) * r[1] - (a.yM() - refY) * r[0];
            mag += r[3];
        }
        return new AppliedLoads(fx, fy, mz, mag);
    }

    /**
     * The resultant of each member's loads under the factored cases, from the model's load
     * records alone: {Fx, Fy} (N, global), the moment about the member's start (N*m, ccw) and
     * the sum of the magnitudes of its loads (N). A load of intensity w along the global unit
     * vector d, at distance s along the member's unit vector e, contributes w d ds and the
     * moment (e x d) w s ds; per-plan intensities are |e_x| as much per member length;
     * self-weight acts downward at mid-length. Members with no load are absent.
     */
    public static Map<String, double[]> memberResultants(Model model, Map<String, Double> factors) {
        Map<String, double[]> out = new LinkedHashMap<>();
        for (var f : factors.entrySet()) {
            LoadCase c = model.loadCase(f.getKey());
            double k = f.getValue();
            for (MemberLoad l : c.memberLoads()) {
                Member m = model.member(l.member());
                Model.Placement e = model.placementOf(m);
                double ex = e.cx(), ey = e.cy();
                double[] r = out.computeIfAbsent(m.name(), x -> new double[4]);
                if (l instanceof MemberLoad.Couple cp) {
                    r[2] += k * cp.momentNm();
                    continue;
                }
                double total, firstMoment; // integral of w ds and of w s ds along the member
                double[] d;
                if (l instanceof MemberLoad.Distributed w) {
                    double scale = w.perPlan() ? Math.abs(ex) : 1.0;
                    double h = w.toM() - w.fromM();
                    total = scale * 0.5 * (w.w1NPerM() + w.w2NPerM()) * h;
                    firstMoment = scale * (w.w1NPerM() * h * (w.fromM() + h / 2)
                            + (w.w2NPerM() - w.w1NPerM()) * h / 2 * (w.fromM() + 2 * h / 3));
                    d = w.dir().unit(ex, ey);
                } else {
                    MemberLoad.Point p = (MemberLoad.Point) l;
                    total = p.forceN();
                    firstMoment = p.forceN() * p.atM();
                    d = p.dir().unit(ex, ey);
                }
                r[0] += k * total * d[0];
                r[1] += k * total * d[1];
                r[2] += k * (ex * d[1] - ey * d[0]) * firstMoment;
                r[3] += Math.abs(k * total);
            }
            if (c.selfWeight()) {
                for (Member m : model.members().values()) {
                    Model.Placement at = model.placementOf(m);
                    double w = model.materialOf(m).weightDensityNPerM3() * model.sectionOf(m).areaM2() * at.lengthM();
                    if (w == 0) continue;
                    double[] r = out.computeIfAbsent(m.name(), x -> new double[4]);
                    r[1] -= k * w;
                    r[2] -= k * w * 0.5 * at.dxM(); // acting at mid-length: lever arm half the member's x extent
                    r[3] += Math.abs(k * w);
                }
            }
        }
        return out;
    }
}
