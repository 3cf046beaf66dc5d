package plumbline.solve;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import plumbline.model.LoadCase;
import plumbline.model.LoadDirection;
import plumbline.model.Material;
import plumbline.model.Member;
import plumbline.model.MemberLoad;
import plumbline.model.Model;
import plumbline.model.Section;
import plumbline.model.Temperature;

/**
 * The loads on one member resolved into its local axes (x along the member, y its normal
 * turned counter-clockwise), in N, N/m and N*m, per unit member length; plus the free
 * thermal strain and curvature. This is the shared description of member loads: both
 * engines start from it, and nothing of their solving is in it.
 *
 * <p>A global load (gx, gy) has local components (gx cx + gy cy, -gx cy + gy cx) where
 * (cx, cy) is the member's unit vector. A load given per plan (per unit horizontal
 * projection) is |cx| times as intense per unit member length.
 */
public record MemberActions(double lengthM, List<Linear> distributed, List<Point> points, List<Couple> couples,
                            double thermalStrain, double thermalCurvaturePerM) {

    public MemberActions {
        distributed = List.copyOf(distributed);
        points = List.copyOf(points);
        couples = List.copyOf(couples);
    }

    /** Linearly varying load from a to b: axial p and transverse q intensities (N/m) at a and at b. */
    public record Linear(double aM, double bM, double p1, double p2, double q1, double q2) {
        public Linear scaled(double f) {
            return new Linear(aM, bM, p1 * f, p2 * f, q1 * f, q2 * f);
        }
    }

    /** Concentrated force at a: axial px and transverse qy (N). */
    public record Point(double aM, double px, double qy) {
        public Point scaled(double f) {
            return new Point(aM, px * f, qy * f);
        }
    }

    /** Concentrated couple at a, counter-clockwise positive (N*m). */
    public record Couple(double aM, double mz) {
        public Couple scaled(double f) {
            return new Couple(aM, mz * f);
        }
    }

    public static MemberActions none(double lengthM) {
        return new MemberActions(lengthM, List.of(), List.of(), List.of(), 0, 0);
    }

    public boolean isEmpty() {
        return distributed.isEmpty() && points.isEmpty() && couples.isEmpty() && thermalStrain == 0
                && thermalCurvaturePerM == 0;
    }

    /**
     * A factored sum of actions, k1 a1 + k2 a2 + ...: every load of a1 scaled by k1, then every
     * load of a2 scaled by k2 ..., in their order (loads on one member superpose; nothing is
     * merged), the thermal actions summed in the same order. A combination forms one per
     * member, in one pass without intermediate lists.
     */
    public static final class Sum {
        private final double lengthM;
        private final List<Linear> distributed = new ArrayList<>();
        private final List<Point> points = new ArrayList<>();
        private final List<Couple> couples = new ArrayList<>();
        private double thermalStrain, thermalCurvaturePerM;

        public Sum(double lengthM) {
            this.lengthM = lengthM;
        }

        public Sum add(MemberActions a, double k) {
            for (int i = 0, n = a.distributed.size(); i < n; i++) distributed.add(a.distributed.get(i).scaled(k));
            for (int i = 0, n = a.points.size(); i < n; i++) points.add(a.points.get(i).scaled(k));
            for (int i = 0, n = a.couples.size(); i < n; i++) couples.add(a.couples.get(i).scaled(k));
            thermalStrain += a.thermalStrain * k;
            thermalCurvaturePerM += a.thermalCurvaturePerM * k;
            return this;
        }

        public MemberActions result() {
            return new MemberActions(lengthM, distributed, points, couples, thermalStrain, thermalCurvaturePerM);
        }
    }

    /** Resultant local forces and moment about the start: {sum px, sum qy, moment about x=0 (ccw)}. */
    public double[] resultantAboutStart() {
        double fx = 0, fy = 0, m = 0;
        // indexed loops: an iterator per list per member per load set is garbage the quick compiler cannot avoid
        for (int i = 0, n = distributed.size(); i < n; i++) {
            Linear l = distributed.get(i);
            double len = l.bM - l.aM;
            fx += 0.5 * (l.p1 + l.p2) * len;
            double fq = 0.5 * (l.q1 + l.q2) * len;
            fy += fq;
            // centroid of a trapezoid from a: len (q1 + 2 q2) / (3 (q1 + q2)); moment = integral q(x) x dx
            m += l.q1 * len * (l.aM + len / 2) + (l.q2 - l.q1) * len / 2 * (l.aM + 2 * len / 3);
        }
        for (int i = 0, n = points.size(); i < n; i++) {
            Point p = points.get(i);
            fx += p.px;
            fy += p.qy;
            m += p.qy * p.aM;
        }
        for (int i = 0, n = couples.size(); i < n; i++) m += couples.get(i).mz;
        return new double[]{fx, fy, m};
    }

    /** The local actions of load case {@code c} on every member, keyed by member name (members with none are absent). */
    public static Map<String, MemberActions> of(Model model, LoadCase c) {
        Map<String, List<MemberLoad>> byMember = new HashMap<>();
        for (MemberLoad l : c.memberLoads()) byMember.computeIfAbsent(l.member(), k -> new ArrayList<>()).add(l);
        Map<String, List<Temperature>> temps = new HashMap<>();
        for (Temperature t : c.temperatures()) temps.computeIfAbsent(t.member(), k -> new ArrayList<>()).add(t);
        Map<String, MemberActions> out = new LinkedHashMap<>();
        for (Member m : model.members().values()) {
            List<MemberLoad> loads = byMember.getOrDefault(m.name(), List.of());
            List<Temperature> ts = temps.getOrDefault(m.name(), List.of());
            if (loads.isEmpty() && ts.isEmpty() && !c.selfWeight()) continue;
            MemberActions a = of(model, m, loads, ts, c.selfWeight());
            if (!a.isEmpty()) out.put(m.name(), a);
        }
        return out;
    }

    static MemberActions of(Model model, Member m, List<MemberLoad> loads, List<Temperature> temps, boolean selfWeight) {
        double len = model.lengthM(m);
        double[] d = model.directionOf(m);
        double cx = d[0], cy = d[1];
        List<Linear> dist = new ArrayList<>();
        List<Point> pts = new ArrayList<>();
        List<Couple> cps = new ArrayList<>();
        for (MemberLoad l : loads) {
            if (l instanceof MemberLoad.Distributed w) {
                double scale = w.perPlan() ? Math.abs(cx) : 1.0;
                double[] a = local(w.dir(), w.w1NPerM() * scale, cx, cy);
                double[] b = local(w.dir(), w.w2NPerM() * scale, cx, cy);
                dist.add(new Linear(w.fromM(), w.toM(), a[0], b[0], a[1], b[1]));
            } else if (l instanceof MemberLoad.Point p) {
                double[] a = local(p.dir(), p.forceN(), cx, cy);
                pts.add(new Point(p.atM(), a[0], a[1]));
            } else if (l instanceof MemberLoad.Couple c) {
                cps.add(new Couple(c.atM(), c.momentNm()));
            }
        }
        if (selfWeight) {
            Section s = model.sectionOf(m);
            Material mat = model.materialOf(m);
            double w = mat.weightDensityNPerM3() * s.areaM2();
            if (w != 0) {
                double[] a = local(LoadDirection.GRAVITY, w, cx, cy);
                dist.add(new Linear(0, len, a[0], a[0], a[1], a[1]));
            }
        }
        double strain = 0, curvature = 0;
        for (Temperature t : temps) {
            Material mat = model.materialOf(m);
            strain += mat.alphaPerK() * t.uniformK();
            if (t.gradientK() != 0) {
                // top (local +y) warmer lengthens the top fibre: the member curves concave towards -y
                curvature += -mat.alphaPerK() * t.gradientK() / model.sectionOf(m).depthM();
            }
        }
        return new MemberActions(len, dist, pts, cps, strain, curvature);
    }

    /** A load of intensity v in direction dir, as local {axial, transverse} components. */
    static double[] local(LoadDirection dir, double v, double cx, double cy) {
        double gx, gy;
        switch (dir) {
            case LOCAL_X:
                return new double[]{v, 0};
            case LOCAL_Y:
                return new double[]{0, v};
            case X:
                gx = v;
                gy = 0;
                break;
            case GRAVITY:
                gx = 0;
                gy = -v;
                break;
            default:
                gx = 0;
                gy = v;
        }
        return new double[]{gx * cx + gy * cy, -gx * cy + gy * cx};
    }
}
