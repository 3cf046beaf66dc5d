package plumbline.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import com.lowagie.text.DocumentException;
import com.lowagie.text.pdf.PdfPTable;
import plumbline.model.LimitState;
import plumbline.model.LoadCase;
import plumbline.model.Material;
import plumbline.model.Member;
import plumbline.model.MemberLoad;
import plumbline.model.Model;
import plumbline.model.Node;
import plumbline.model.NodeLoad;
import plumbline.model.Section;
import plumbline.model.Settlement;
import plumbline.model.Support;
import plumbline.model.Temperature;
import plumbline.review.LoadSet;
import plumbline.units.Dimension;
import plumbline.units.UnitSystem;

/**
 * The input echo of the report: the model as it was read and checked, table by table
 * (nodes, supports, members with their direction, sections, materials, loads with their
 * values, load sets with their factors), in the model's units; section properties in mm
 * (or in) and E in GPa (or ksi), as a checker reads them off a section table.
 */
final class ModelEcho {

    /** Rows per table beyond which the echo stops and says so (the input file's SHA-256 identifies the rest). */
    static final int ROWS = 400;

    private final PdfKit kit;
    private final Model m;
    private final UnitSystem u;

    ModelEcho(PdfKit kit, Model m) {
        this.kit = kit;
        this.m = m;
        this.u = m.units();
    }

    private String len() {
        return u.length().symbol();
    }

    private String show(double si, Dimension d) {
        return Console.fmt(u.fromInternal(si, d));
    }

    private boolean imperial() {
        return Shown.unit(u, Dimension.LENGTH).equals("in");
    }

    void write(List<LoadSet> loadSets) throws DocumentException {
        nodes();
        supports();
        members();
        sections();
        materials();
        loads();
        loadSets(loadSets);
    }

    private void add(PdfPTable t, String... cells) {
        for (String c : cells) t.addCell(PdfKit.cell(c, PdfKit.Style.SMALL, null));
    }

    private void finish(PdfPTable t, int rows, String what) throws DocumentException {
        kit.doc.add(t);
        if (rows > ROWS) kit.para(rows + " " + what + " in all; the first " + ROWS + " are listed. The input file (its SHA-256 "
                + "on page 1) holds the rest.", PdfKit.Style.SMALL);
    }

    private void nodes() throws DocumentException {
        kit.caption("Nodes (coordinates in " + len() + ", x to the right, y up)");
        PdfPTable t = PdfKit.table(new float[]{2, 1.5f, 1.5f, 2, 2, 1.5f, 1.5f}, "Node", "x", "y", "", "Node", "x", "y");
        List<Node> nodes = new ArrayList<>(m.nodes().values());
        int shown = Math.min(ROWS, nodes.size()), half = (shown + 1) / 2;
        for (int i = 0; i < half; i++) { // two nodes a row, to keep the table short
            Node a = nodes.get(i);
            add(t, a.name(), show(a.xM(), Dimension.LENGTH), show(a.yM(), Dimension.LENGTH), "");
            if (i + half < shown) {
                Node b = nodes.get(i + half);
                add(t, b.name(), show(b.xM(), Dimension.LENGTH), show(b.yM(), Dimension.LENGTH));
            } else {
                add(t, "", "", "");
            }
        }
        finish(t, nodes.size(), "nodes");
    }

    private void supports() throws DocumentException {
        kit.caption("Supports (restraint axes turned counter-clockwise by the angle; springs along them)");
        if (m.supports().isEmpty()) {
            kit.para("None.", PdfKit.Style.SMALL);
            return;
        }
        PdfPTable t = PdfKit.table(new float[]{1.5f, 2.6f, 1.2f, 4}, "Node", "Restrained", "Angle (deg)", "Springs");
        int k = 0;
        for (Support s : m.supports().values()) {
            if (k++ == ROWS) break;
            List<String> fixed = new ArrayList<>();
            if (s.fixUx()) fixed.add("ux");
            if (s.fixUy()) fixed.add("uy");
            if (s.fixRz()) fixed.add("rz");
            String kind = s.fixUx() && s.fixUy() && s.fixRz() ? "fixed" : s.fixUx() && s.fixUy() ? "pinned"
                    : fixed.size() == 1 && !s.fixRz() ? "roller" : fixed.isEmpty() ? "springs only" : "restrained";
            List<String> springs = new ArrayList<>();
            if (s.springUxNPerM() > 0) springs.add("kx " + show(s.springUxNPerM(), Dimension.TRANSLATIONAL_STIFFNESS) + " "
                    + u.symbol(Dimension.TRANSLATIONAL_STIFFNESS));
            if (s.springUyNPerM() > 0) springs.add("ky " + show(s.springUyNPerM(), Dimension.TRANSLATIONAL_STIFFNESS) + " "
                    + u.symbol(Dimension.TRANSLATIONAL_STIFFNESS));
            if (s.springRzNmPerRad() > 0) springs.add("kr " + show(s.springRzNmPerRad(), Dimension.ROTATIONAL_STIFFNESS) + " "
                    + u.symbol(Dimension.MOMENT) + "/rad");
            add(t, s.node(), kind + (fixed.isEmpty() ? "" : " (" + String.join(", ", fixed) + ")"),
                    Console.fmt(Math.toDegrees(s.angleRad())), springs.isEmpty() ? "-" : String.join("; ", springs));
        }
        finish(t, m.supports().size(), "supports");
    }

    private void members() throws DocumentException {
        kit.caption("Members (local x from start to end: the signs of N, V and M follow it; lengths in " + len() + ")");
        PdfPTable t = PdfKit.table(new float[]{1.5f, 2.4f, 1.2f, 1.3f, 1.4f, 2.6f}, "Member", "Start -> end", "Length",
                "Angle (deg)", "Section", "Releases");
        int k = 0;
        for (Member mem : m.members().values()) {
            if (k++ == ROWS) break;
            double[] d = m.directionOf(mem);
            String releases = mem.truss() ? "truss member (N only)" : mem.hingeStart() && mem.hingeEnd() ? "hinge at both ends"
                    : mem.hingeStart() ? "hinge at start" : mem.hingeEnd() ? "hinge at end" : "-";
            add(t, mem.name(), mem.from() + " -> " + mem.to(), show(m.lengthM(mem), Dimension.LENGTH),
                    Console.fmt(Math.toDegrees(Math.atan2(d[1], d[0]))), mem.section(), releases);
        }
        finish(t, m.members().size(), "members");
    }

    private void sections() throws DocumentException {
        boolean imp = imperial();
        String area = imp ? "A (in2)" : "A (mm2)", inertia = imp ? "I (in4)" : "I (10^6 mm4)", depth = imp ? "Depth (in)" : "Depth (mm)";
        double perM = imp ? 1 / 0.0254 : 1000, iScale = imp ? 1 : 1e-6;
        kit.caption("Sections");
        PdfPTable t = PdfKit.table(new float[]{2, 1.6f, 1.6f, 1.4f, 2}, "Section", area, inertia, depth, "Material");
        for (Section s : m.sections().values()) {
            add(t, s.name(), Console.fmt(s.areaM2() * perM * perM), Console.fmt(s.inertiaM4() * Math.pow(perM, 4) * iScale),
                    s.depthM() > 0 ? Console.fmt(s.depthM() * perM) : "-", s.material());
        }
        kit.doc.add(t);
    }

    private void materials() throws DocumentException {
        boolean imp = imperial();
        kit.caption("Materials");
        PdfPTable t = PdfKit.table(new float[]{2, 1.6f, 2, 2}, "Material", imp ? "E (ksi)" : "E (GPa)",
                "Weight density (" + u.symbol(Dimension.WEIGHT_DENSITY) + ")", "Expansion (10^-6 /K)");
        double ksi = 6.894757293168361e6; // 1 ksi in Pa (1000 lbf / in2, NIST SP 811)
        for (Material mat : m.materials().values()) {
            add(t, mat.name(), Console.fmt(mat.ePa() / (imp ? ksi : 1e9)), mat.weightDensityNPerM3() > 0
                            ? show(mat.weightDensityNPerM3(), Dimension.WEIGHT_DENSITY) : "-",
                    mat.alphaPerK() > 0 ? Console.fmt(mat.alphaPerK() * 1e6) : "-");
        }
        kit.doc.add(t);
    }

    private void loads() throws DocumentException {
        kit.caption("Loads as given (positions from the member's start in " + len() + "; a positive value acts along "
                + "the positive direction named: x, y global, local-x, local-y the member's own axes, gravity downward)");
        if (m.loadCases().isEmpty()) {
            kit.para("No load cases.", PdfKit.Style.SMALL);
            return;
        }
        PdfPTable t = PdfKit.table(new float[]{1.4f, 1.6f, 1.6f, 2.6f, 3.2f}, "Load case", "Load", "On", "Where", "Value");
        int rows = 0;
        for (LoadCase c : m.loadCases()) {
            List<String[]> lines = lines(c);
            for (String[] l : lines) {
                if (rows++ >= ROWS) continue;
                add(t, c.name() + (l == lines.get(0) ? " (" + c.type() + (c.pattern() ? ", pattern" : "") + ")" : ""), l[0], l[1], l[2], l[3]);
            }
        }
        finish(t, rows, "loads");
    }

    /** One row {load, on, where, value} per load of a case. */
    private List<String[]> lines(LoadCase c) {
        List<String[]> out = new ArrayList<>();
        String f = u.force().symbol(), w = u.symbol(Dimension.FORCE_PER_LENGTH), mo = u.symbol(Dimension.MOMENT);
        if (c.selfWeight()) out.add(new String[]{"self-weight", "every member", "whole length", "from the sections' A and weight density"});
        for (MemberLoad l : c.memberLoads()) {
            if (l instanceof MemberLoad.Distributed d) {
                double lm = m.lengthM(m.member(d.member()));
                String where = d.fromM() == 0 && Math.abs(d.toM() - lm) <= 1e-9 * lm ? "whole length"
                        : show(d.fromM(), Dimension.LENGTH) + " to " + show(d.toM(), Dimension.LENGTH);
                String value = (d.w1NPerM() == d.w2NPerM() ? show(d.w1NPerM(), Dimension.FORCE_PER_LENGTH)
                        : show(d.w1NPerM(), Dimension.FORCE_PER_LENGTH) + " to " + show(d.w2NPerM(), Dimension.FORCE_PER_LENGTH))
                        + " " + w + ", " + d.dir().word + (d.perPlan() ? ", per plan length" : "");
                out.add(new String[]{"distributed", "member " + d.member(), where, value});
            } else if (l instanceof MemberLoad.Point p) {
                out.add(new String[]{"point", "member " + p.member(), "at " + show(p.atM(), Dimension.LENGTH),
                        show(p.forceN(), Dimension.FORCE) + " " + f + ", " + p.dir().word});
            } else if (l instanceof MemberLoad.Couple cp) {
                out.add(new String[]{"couple", "member " + cp.member(), "at " + show(cp.atM(), Dimension.LENGTH),
                        show(cp.momentNm(), Dimension.MOMENT) + " " + mo + ", counter-clockwise +"});
            }
        }
        for (NodeLoad n : c.nodeLoads()) {
            out.add(new String[]{"node load", "node " + n.node(), "-", String.format(Locale.ROOT, "Fx %s, Fy %s %s; Mz %s %s",
                    show(n.fxN(), Dimension.FORCE), show(n.fyN(), Dimension.FORCE), f, show(n.mzNm(), Dimension.MOMENT), mo)});
        }
        for (Temperature tp : c.temperatures()) {
            out.add(new String[]{"temperature", "member " + tp.member(), "whole length", "uniform change " + Console.fmt(tp.uniformK())
                    + " K, local +y face less local -y face " + Console.fmt(tp.gradientK()) + " K"});
        }
        for (Settlement s : c.settlements()) {
            out.add(new String[]{"settlement", "node " + s.node(), "-", "ux " + Shown.withUnit(u, s.uxM(), Dimension.LENGTH) + ", uy "
                    + Shown.withUnit(u, s.uyM(), Dimension.LENGTH) + ", rz " + Console.fmt(s.rzRad()) + " rad"});
        }
        if (out.isEmpty()) out.add(new String[]{"none", "-", "-", "-"});
        return out;
    }

    private void loadSets(List<LoadSet> sets) throws DocumentException {
        kit.caption("Load sets checked (combination factors on the load cases)");
        PdfPTable t = PdfKit.table(new float[]{1.6f, 1, 4.4f, 2.2f}, "Load set", "Limit state", "Factors", "From");
        int k = 0;
        for (LoadSet s : sets) {
            if (k++ == ROWS) break;
            add(t, s.name(), s.limitState() == LimitState.NONE ? "-" : s.limitState().toString(), PdfReport.factors(s), s.origin());
        }
        finish(t, sets.size(), "load sets");
    }
}
