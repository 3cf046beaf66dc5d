package plumbline.statics;

import java.util.Map;
import plumbline.model.LoadCase;
import plumbline.model.LoadDirection;
import plumbline.model.Member;
import plumbline.model.MemberLoad;
import plumbline.model.Model;
import plumbline.model.Node;
import plumbline.model.NodeLoad;

/**
 * Global resultant of the applied loads of a factored set of load cases, worked out here
 * from the model alone (not from either engine): total Fx, Fy (N) and moment (N*m, ccw)
 * about a reference point, and the sum of the magnitudes of all applied forces, the scale
 * against which residuals are judged.
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
            for (MemberLoad l : c.memberLoads()) {
                Member m = model.member(l.member());
                Node a = model.node(m.from()), b = model.node(m.to());
                double len = model.lengthM(m), ex = (b.xM() - a.xM()) / len, ey = (b.yM() - a.yM()) / len;
                double ox = a.xM() - refX, oy = a.yM() - refY;
                if (l instanceof MemberLoad.Couple cp) {
                    mz += k * cp.momentNm();
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
                    d = unit(w.dir(), ex, ey);
                } else {
                    MemberLoad.Point p = (MemberLoad.Point) l;
                    total = p.forceN();
                    firstMoment = p.forceN() * p.atM();
                    d = unit(p.dir(), ex, ey);
                }
                fx += k * total * d[0];
                fy += k * total * d[1];
                // moment of w d ds at a + s e about the reference: (o x d) total + (e x d) first moment
                mz += k * ((ox * d[1] - oy * d[0]) * total + (ex * d[1] - ey * d[0]) * firstMoment);
                mag += Math.abs(k * total);
            }
            if (c.selfWeight()) {
                for (Member m : model.members().values()) {
                    Node a = model.node(m.from()), b = model.node(m.to());
                    double w = model.materialOf(m).weightDensityNPerM3() * model.sectionOf(m).areaM2() * model.lengthM(m);
                    double cx = 0.5 * (a.xM() + b.xM()) - refX;
                    fy -= k * w;
                    mz -= k * w * cx;
                    mag += Math.abs(k * w);
                }
            }
        }
        return new AppliedLoads(fx, fy, mz, mag);
    }

    /** Unit vector of a load direction on a member with unit vector (ex, ey); gravity is -y. */
    static double[] unit(LoadDirection dir, double ex, double ey) {
        return switch (dir) {
            case X -> new double[]{1, 0};
            case Y -> new double[]{0, 1};
            case GRAVITY -> new double[]{0, -1};
            case LOCAL_X -> new double[]{ex, ey};
            case LOCAL_Y -> new double[]{-ey, ex};
        };
    }
}
