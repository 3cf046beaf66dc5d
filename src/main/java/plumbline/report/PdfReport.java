package plumbline.report;

import java.awt.Color;
import java.awt.Graphics2D;
import java.io.ByteArrayOutputStream;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.function.Consumer;
import com.lowagie.text.Chunk;
import com.lowagie.text.Document;
import com.lowagie.text.DocumentException;
import com.lowagie.text.Element;
import com.lowagie.text.Font;
import com.lowagie.text.FontFactory;
import com.lowagie.text.Image;
import com.lowagie.text.PageSize;
import com.lowagie.text.Paragraph;
import com.lowagie.text.Phrase;
import com.lowagie.text.Rectangle;
import com.lowagie.text.pdf.PdfContentByte;
import com.lowagie.text.pdf.PdfPCell;
import com.lowagie.text.pdf.PdfPTable;
import com.lowagie.text.pdf.PdfPageEventHelper;
import com.lowagie.text.pdf.PdfTemplate;
import com.lowagie.text.pdf.PdfWriter;
import plumbline.model.Claim;
import plumbline.model.ClaimSet;
import plumbline.model.LimitState;
import plumbline.model.LoadCase;
import plumbline.model.Model;
import plumbline.model.Quantity;
import plumbline.review.Agreement;
import plumbline.review.Analysis;
import plumbline.review.ClaimResult;
import plumbline.review.DrawnLoadSets;
import plumbline.review.LoadSet;
import plumbline.review.LoadSetResult;
import plumbline.review.Review;
import plumbline.solve.EngineResult;
import plumbline.solve.Equilibrium;
import plumbline.solve.Solution;
import plumbline.statics.ClaimedEquilibrium;
import plumbline.statics.Determinacy;
import plumbline.units.Dimension;
import plumbline.units.UnitSystem;

/**
 * The discrepancy report a checker attaches to a calculation package: title block,
 * summary, statics, equilibrium of the claims, the comparison, queries for the originator,
 * drawings, the force-method working, warnings, cautions and a sign-off block. The only
 * class that uses OpenPDF. Flagged rows are shaded, set in bold and marked with "!!" or
 * "?" so a grey-scale print still shows them.
 *
 * Over 400 lines because it writes every section of the report in order, one method a
 * section, sharing the page furniture (footer, caution, table styles); the drawings are in
 * {@link Drawings}.
 */
public final class PdfReport {

    static final String CAUTION = "This is an independent check of a simplified, linear-elastic, small-displacement plane model "
            + "against the numbers claimed for it. It does not replace the engineer of record, licensed review or the local "
            + "codes, and agreement with the claims does not show that the model represents the structure.";

    private static final Color INK = new Color(0x21, 0x21, 0x21);
    private static final Color RULE = new Color(0x9E, 0x9E, 0x9E);
    private static final Color SHADE_MISMATCH = new Color(0xD6, 0xD6, 0xD6);
    private static final Color SHADE_MARGINAL = new Color(0xEC, 0xEC, 0xEC);
    private static final Color HEAD = new Color(0x37, 0x47, 0x4F);

    private final Font title = FontFactory.getFont(FontFactory.HELVETICA_BOLD, 15, INK);
    private final Font h1 = FontFactory.getFont(FontFactory.HELVETICA_BOLD, 11.5f, HEAD);
    private final Font body = FontFactory.getFont(FontFactory.HELVETICA, 9, INK);
    private final Font small = FontFactory.getFont(FontFactory.HELVETICA, 7.5f, INK);
    private final Font smallBold = FontFactory.getFont(FontFactory.HELVETICA_BOLD, 7.5f, INK);
    private final Font bold = FontFactory.getFont(FontFactory.HELVETICA_BOLD, 9, INK);
    private final Font headCell = FontFactory.getFont(FontFactory.HELVETICA_BOLD, 7.5f, Color.WHITE);

    private final Review review;
    private final ResultsTree.Inputs inputs;
    private final Double agreement;
    private final List<String> notes;
    private final LocalDate date;

    private PdfReport(Review review, ResultsTree.Inputs inputs, Double agreement, List<String> notes, LocalDate date) {
        this.review = review;
        this.inputs = inputs;
        this.agreement = agreement;
        this.notes = notes;
        this.date = date;
    }

    public static byte[] render(Review review, ResultsTree.Inputs inputs, Double agreement, List<String> notes, LocalDate date) {
        try {
            return new PdfReport(review, inputs, agreement, notes, date).build();
        } catch (DocumentException e) {
            throw new IllegalStateException("PDF layout failed: " + e.getMessage(), e);
        }
    }

    /** "Page x of y" and the job title on every page; y is filled in when the document closes. */
    private static final class Footer extends PdfPageEventHelper {
        private final String text;
        private PdfTemplate total;
        private final com.lowagie.text.pdf.BaseFont font;

        Footer(String text) {
            this.text = text;
            try {
                font = com.lowagie.text.pdf.BaseFont.createFont(com.lowagie.text.pdf.BaseFont.HELVETICA,
                        com.lowagie.text.pdf.BaseFont.WINANSI, false);
            } catch (Exception e) {
                throw new IllegalStateException(e);
            }
        }

        @Override
        public void onOpenDocument(PdfWriter writer, Document document) {
            total = writer.getDirectContent().createTemplate(40, 12);
        }

        @Override
        public void onEndPage(PdfWriter writer, Document document) {
            PdfContentByte cb = writer.getDirectContent();
            String left = text;
            String page = "page " + writer.getPageNumber() + " of ";
            float y = document.bottom() - 22;
            cb.setColorStroke(RULE);
            cb.setLineWidth(0.4f);
            cb.moveTo(document.left(), y + 10);
            cb.lineTo(document.right(), y + 10);
            cb.stroke();
            cb.beginText();
            cb.setFontAndSize(font, 7.5f);
            cb.setColorFill(INK);
            cb.setTextMatrix(document.left(), y);
            cb.showText(left);
            float w = font.getWidthPoint(page, 7.5f);
            cb.setTextMatrix(document.right() - w - 18, y);
            cb.showText(page);
            cb.endText();
            cb.addTemplate(total, document.right() - 18, y);
        }

        @Override
        public void onCloseDocument(PdfWriter writer, Document document) {
            total.beginText();
            total.setFontAndSize(font, 7.5f);
            total.setColorFill(INK);
            total.setTextMatrix(0, 0);
            total.showText(String.valueOf(writer.getPageNumber() - 1)); // the writer has moved past the last page
            total.endText();
        }
    }

    private byte[] build() throws DocumentException {
        Model m = review.analysis().model();
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        Document doc = new Document(PageSize.A4, 48, 48, 48, 60);
        PdfWriter writer = PdfWriter.getInstance(doc, out);
        String jobTitle = m.job().title().isEmpty() ? m.file() : m.job().title();
        writer.setPageEvent(new Footer("Plumbline " + ResultsTree.TOOL_VERSION + " discrepancy report - " + ascii(jobTitle)));
        doc.addTitle("Plumbline discrepancy report: " + ascii(jobTitle));
        doc.addCreator("Plumbline " + ResultsTree.TOOL_VERSION);
        doc.open();
        titleBlock(doc, m, jobTitle);
        summary(doc);
        modelSketch(doc, writer, m);
        statics(doc, writer, m);
        equilibrium(doc, m);
        comparison(doc, m);
        queries(doc, m);
        diagrams(doc, writer, m);
        working(doc);
        warnings(doc);
        cautions(doc);
        signOff(doc, m);
        doc.close();
        return out.toByteArray();
    }

    /** The standard fonts hold Latin-1 only; anything else is shown as '?'. */
    static String ascii(String s) {
        StringBuilder sb = new StringBuilder();
        for (char c : s.toCharArray()) sb.append(c < 256 ? c : '?');
        return sb.toString();
    }

    private void heading(Document doc, String text) throws DocumentException {
        Paragraph p = new Paragraph(text, h1);
        p.setSpacingBefore(12);
        p.setSpacingAfter(4);
        doc.add(p);
    }

    private void para(Document doc, String text, Font f) throws DocumentException {
        Paragraph p = new Paragraph(ascii(text), f);
        p.setSpacingAfter(3);
        doc.add(p);
    }

    private PdfPCell cell(String text, Font f, Color shade) {
        PdfPCell c = new PdfPCell(new Phrase(ascii(text), f));
        c.setBorderColor(RULE);
        c.setBorderWidth(0.4f);
        c.setPadding(2.5f);
        if (shade != null) c.setBackgroundColor(shade);
        return c;
    }

    private PdfPTable table(float[] widths, String... heads) {
        PdfPTable t = new PdfPTable(widths);
        t.setWidthPercentage(100);
        t.setHeaderRows(1);
        t.setSpacingBefore(3);
        t.setSpacingAfter(6);
        for (String h : heads) {
            PdfPCell c = cell(h, headCell, HEAD);
            t.addCell(c);
        }
        return t;
    }

    private void titleBlock(Document doc, Model m, String jobTitle) throws DocumentException {
        Paragraph p = new Paragraph("Independent check - discrepancy report", title);
        p.setSpacingAfter(2);
        doc.add(p);
        para(doc, jobTitle, bold);
        PdfPTable t = new PdfPTable(new float[]{1.3f, 4f});
        t.setWidthPercentage(100);
        t.setSpacingBefore(6);
        List<String> sources = new ArrayList<>();
        for (ClaimSet cs : m.claims()) if (!cs.source().isEmpty()) sources.add(cs.source());
        String[][] rows = {
                {"Project", m.job().project()}, {"Calculation", m.job().calcRef()}, {"Claims from", String.join("; ", sources)},
                {"Scope of check", m.job().scope()}, {"Category", m.job().category()},
                {"Standards", m.standardCombinations().isEmpty() ? "none named (user combinations only)"
                        : String.join(", ", standards(m))},
                {"Originator", m.job().originator()}, {"Checker", m.job().checker()},
                {"Date", date.toString()}, {"Tool", "Plumbline " + ResultsTree.TOOL_VERSION + " (stiffness and force methods)"},
                {"Units", m.units().force().symbol() + ", " + m.units().length().symbol() + " and their products"},
        };
        for (String[] r : rows) {
            t.addCell(cell(r[0], smallBold, null));
            t.addCell(cell(r[1].isEmpty() ? "-" : r[1], small, null));
        }
        for (int i = 0; i < inputs.files().size(); i++) {
            t.addCell(cell(i == 0 ? "Input files (SHA-256)" : "", smallBold, null));
            t.addCell(cell(inputs.files().get(i) + "  " + inputs.sha256().get(i), small, null));
        }
        doc.add(t);
        para(doc, "Caution: " + CAUTION, small);
    }

    static List<String> standards(Model m) {
        List<String> out = new ArrayList<>();
        for (String s : m.standardCombinations()) {
            out.add(switch (s) {
                case "asce7-strength" -> "ASCE/SEI 7-16 section 2.3.1 (strength)";
                case "asce7-asd" -> "ASCE/SEI 7-16 section 2.4.1 (allowable stress)";
                case "en1990-6.10" -> "EN 1990:2002+A1:2005 expression (6.10)";
                default -> "EN 1990:2002+A1:2005 expressions (6.10a), (6.10b)";
            });
        }
        return out;
    }

    private void summary(Document doc) throws DocumentException {
        heading(doc, "1  Summary");
        long ok = count(ClaimResult.Status.OK), mg = count(ClaimResult.Status.MARGINAL), mm = count(ClaimResult.Status.MISMATCH);
        Paragraph v = new Paragraph();
        v.add(new Chunk("Verdict: " + review.verdict().word.toUpperCase(Locale.ROOT), FontFactory.getFont(FontFactory.HELVETICA_BOLD, 13, INK)));
        v.add(new Chunk(String.format(Locale.ROOT, "      %d claims: %d ok, %d marginal, %d mismatch", ok + mg + mm, ok, mg, mm), body));
        v.setSpacingAfter(2);
        doc.add(v);
        para(doc, "The verdict means: " + review.verdict().meaning(), review.verdict().flagged ? bold : body);
        Determinacy.Result d = review.analysis().determinacy();
        para(doc, "Statics: " + d.classification().word + (d.classification() == Determinacy.Classification.INDETERMINATE
                ? " to degree " + d.degree() : "") + (d.mechanisms() > 0 ? ", " + d.mechanisms() + " mechanism(s)" : "")
                + ". " + solvedLine(), body);
        long unbalanced = review.equilibrium().stream().filter(e -> !e.balanced()).count();
        if (unbalanced > 0) para(doc, "Claimed reactions out of balance in " + unbalanced + " combination(s): see section 3.", bold);
        List<ClaimResult> worst = new ArrayList<>(review.claims());
        worst.removeIf(c -> c.status() == ClaimResult.Status.OK);
        worst.sort((a, b) -> Double.compare(b.relativeDifference(), a.relativeDifference()));
        if (worst.isEmpty()) {
            para(doc, "No claim differs from the computed value by more than its tolerance.", body);
            return;
        }
        para(doc, "Largest discrepancies:", bold);
        PdfPTable t = table(new float[]{0.65f, 2.2f, 1.1f, 1.1f, 0.8f, 4.15f}, "Query", "Claim", "Claimed", "Computed", "Diff.", "Likely cause");
        UnitSystem u = review.analysis().model().units();
        for (int i = 0; i < Math.min(6, worst.size()); i++) {
            ClaimResult c = worst.get(i);
            Color shade = shade(c);
            Font f = c.status() == ClaimResult.Status.OK ? small : smallBold;
            t.addCell(cell("Q" + (review.claims().stream().filter(x -> x.status() != ClaimResult.Status.OK).toList().indexOf(c) + 1), f, shade));
            t.addCell(cell(label(c.claim()), f, shade));
            t.addCell(cell(value(u, c.claim().valueInternal(), c.claim().dimension()), f, shade));
            t.addCell(cell(value(u, c.computed(), c.claim().dimension()), f, shade));
            t.addCell(cell(Console.pct(c.relativeDifference()), f, shade));
            t.addCell(cell(c.diagnosis() == null ? "no single slip explains it: query the originator" : c.diagnosis(), small, shade));
        }
        doc.add(t);
    }

    private String solvedLine() {
        Analysis a = review.analysis();
        if (!a.stable()) return "The model cannot carry load as given; no engine results.";
        Review.Safeguards g = review.safeguards();
        String s = "Solved by the " + String.join(" and the ", a.solutions().keySet()) + " method"
                + (a.solutions().size() > 1 ? "s" : "") + String.format(Locale.ROOT, "; equilibrium residual at most %.1e of the load "
                + "(limit %.0e%s)", g.worstResidual(), Equilibrium.TOLERANCE, g.balanced() ? "" : ", exceeded in " + g.worstResidualAt());
        if (agreement != null) s += String.format(Locale.ROOT, "; the two methods agree to %.1e (limit %.0e%s)", agreement,
                Agreement.TOLERANCE, g.enginesAgree() ? "" : ": they DISAGREE");
        for (String n : notes) s += ". " + n;
        return s + ".";
    }

    private long count(ClaimResult.Status s) {
        return review.claims().stream().filter(c -> c.status() == s).count();
    }

    private static Color shade(ClaimResult c) {
        return c.status() == ClaimResult.Status.MISMATCH ? SHADE_MISMATCH : c.status() == ClaimResult.Status.MARGINAL ? SHADE_MARGINAL : null;
    }

    static String label(Claim c) {
        return c.item().word + " " + c.name() + " " + c.quantity() + " (" + c.combo() + ")";
    }

    static String value(UnitSystem u, double si, Dimension d) {
        return Console.fmt(u.fromInternal(si, d)) + " " + u.symbol(d);
    }

    private Image picture(PdfWriter writer, float w, float h, Consumer<Graphics2D> draw) throws DocumentException {
        PdfTemplate tpl = writer.getDirectContent().createTemplate(w, h);
        Graphics2D g = tpl.createGraphicsShapes(w, h);
        try {
            g.setColor(Color.WHITE);
            g.fillRect(0, 0, (int) w, (int) h);
            draw.accept(g);
        } finally {
            g.dispose();
        }
        Image img = Image.getInstance(tpl);
        img.setAlignment(Element.ALIGN_CENTER);
        img.setBorder(Rectangle.BOX);
        img.setBorderWidth(0.4f);
        img.setBorderColor(RULE);
        return img;
    }

    private void modelSketch(Document doc, PdfWriter writer, Model m) throws DocumentException {
        heading(doc, "2  The model as checked");
        para(doc, String.format(Locale.ROOT, "%d nodes, %d members, %d supports, %d load cases, %d load sets checked. "
                        + "Loads drawn: %s.", m.nodes().size(), m.members().size(), m.supports().size(), m.loadCases().size(),
                review.analysis().loadSets().size(), m.loadCases().isEmpty() ? "none"
                        : m.members().size() > Drawings.LOAD_LIMIT ? "none at this size" : "load case " + m.loadCases().get(0).name()), body);
        LoadCase first = m.loadCases().isEmpty() ? null : m.loadCases().get(0);
        doc.add(picture(writer, 499, 230, g -> Drawings.model(g, m, first, 499, 230)));
        if (m.members().size() > Drawings.LABEL_LIMIT) para(doc, "Names and peak values are left out of the drawings of a model "
                + "this size; the tables and the JSON carry them.", small);
        para(doc, "Symbols: wedge = pinned support, wedge on rollers = roller, hatched bar = fixed support, zigzag = spring, "
                + "open circle = hinge (or truss member end), amber arrows = loads.", small);
        int shown = m.members().size() > Drawings.LOAD_LIMIT ? 0 : Math.min(3, m.loadCases().size());
        for (LoadCase c : m.loadCases().subList(Math.min(1, shown), Math.max(Math.min(1, shown), shown))) {
            para(doc, "Loads of load case " + c.name() + " (" + c.type() + (c.pattern() ? ", pattern loaded" : "") + "):", small);
            doc.add(picture(writer, 499, 170, g -> Drawings.model(g, m, c, 499, 170)));
        }
    }

    private void statics(Document doc, PdfWriter writer, Model m) throws DocumentException {
        heading(doc, "3  Determinacy, stability and equilibrium");
        Determinacy.Result d = review.analysis().determinacy();
        para(doc, String.format(Locale.ROOT, "Classification by the rank of the equilibrium matrix: %s. Equations %d, unknown "
                        + "forces %d, rank %d; degree of static indeterminacy %d; mechanisms %d. The counting formula "
                        + "(unknowns less equations) gives %d.", d.classification().word, d.equations(), d.unknowns(), d.rank(),
                d.degree(), d.mechanisms(), d.countingDegree()), body);
        if (!d.remark().isEmpty()) para(doc, d.remark(), bold);
        EngineResult force = review.analysis().engines().get("force");
        if (force != null && force.stable() && !force.notes().isEmpty()) para(doc, "Force method " + force.notes().get(0) + ".", body);
        int k = 1;
        for (Determinacy.Mechanism mech : d.shapes()) {
            para(doc, "Mechanism " + k++ + ": " + mech.description() + ".", bold);
            if (k <= 4) doc.add(picture(writer, 499, 160, g -> Drawings.mechanism(g, m, mech.motion(), 499, 160)));
        }
    }

    private void equilibrium(Document doc, Model m) throws DocumentException {
        UnitSystem u = m.units();
        para(doc, "Equilibrium of the claimed reactions (sums of the claimed reactions and the applied loads; moments about "
                + "the first support; flagged beyond " + Console.pct(ClaimedEquilibrium.DEFAULT_TOLERANCE)
                + " of the applied load, common practice):", bold);
        if (review.equilibrium().isEmpty()) {
            para(doc, "No reactions are claimed.", body);
            return;
        }
        PdfPTable t = table(new float[]{1.3f, 1.1f, 1.1f, 1.3f, 1f, 3.4f}, "Load set", "Sum Fx", "Sum Fy", "Sum M", "Status", "Note");
        for (ClaimedEquilibrium e : review.equilibrium()) {
            Color shade = e.balanced() ? null : SHADE_MISMATCH;
            Font f = e.balanced() ? small : smallBold;
            t.addCell(cell(e.combo(), f, shade));
            t.addCell(cell(e.checkedFx() ? value(u, e.sumFxN(), Dimension.FORCE) : "-", f, shade));
            t.addCell(cell(e.checkedFy() ? value(u, e.sumFyN(), Dimension.FORCE) : "-", f, shade));
            t.addCell(cell(e.checkedMoment() ? value(u, e.sumMomentNm(), Dimension.MOMENT) + " about " + e.referenceNode() : "-", f, shade));
            t.addCell(cell(!e.checkedFx() && !e.checkedFy() && !e.checkedMoment() ? "not checked" : e.balanced() ? "balanced" : "!! OUT OF BALANCE", f, shade));
            t.addCell(cell(e.note(), small, shade));
        }
        doc.add(t);
    }

    private void comparison(Document doc, Model m) throws DocumentException {
        heading(doc, "4  Claims compared");
        para(doc, "Each claim against the stiffness-method and force-method values. Difference relative to the computed "
                + "value; the tolerance and where it comes from are given per claim: (default) reactions 3%, member forces 5%, "
                + "deflections 10% (common practice), (file) set in the claims file, (claim) set on the claim, (--tolerance) "
                + "set by the checker. Rows marked !! are mismatches, ? marginal.", body);
        UnitSystem u = m.units();
        Set<String> combos = new LinkedHashSet<>();
        for (ClaimResult c : review.claims()) combos.add(c.claim().combo());
        int given = m.claims().stream().mapToInt(cs -> cs.claims().size()).sum();
        if (!review.analysis().stable() && given > 0) {
            para(doc, "The model is unstable, so none of the " + given + " claims can be compared: correct the supports or "
                    + "releases (section 3) and check again.", bold);
        } else if (combos.isEmpty()) {
            para(doc, "No claims were given: the report lists the model's results only (see the JSON).", body);
        }
        for (String combo : combos) {
            LoadSet set = review.analysis().loadSets().stream().filter(s -> s.name().equals(combo)).findFirst().orElse(null);
            LimitState state = LimitState.ofEnvelope(combo);
            String envelope = state == LimitState.NONE ? "envelope over all combinations" : "envelope over the " + state + " combinations";
            para(doc, combo + (set != null ? "  -  " + set.origin() + ": " + factors(set) : "  -  " + envelope), bold);
            PdfPTable t = table(new float[]{0.35f, 1.8f, 1.05f, 1.05f, 1.05f, 0.75f, 0.95f, 1.2f, 2.5f},
                    "", "Quantity", "Claimed", "Stiffness", "Force", "Diff.", "Tolerance", "Status", "Diagnosis / governing");
            for (ClaimResult c : review.claims()) {
                if (!c.claim().combo().equals(combo)) continue;
                Color shade = shade(c);
                Font f = c.status() == ClaimResult.Status.OK ? small : smallBold;
                String mark = c.status() == ClaimResult.Status.MISMATCH ? "!!" : c.status() == ClaimResult.Status.MARGINAL ? "?" : "";
                t.addCell(cell(mark, f, shade));
                t.addCell(cell(c.claim().item().word + " " + c.claim().name() + " " + Console.quantityLabel(c.claim(), u), f, shade));
                String written = Console.asWritten(c.claim(), u);
                t.addCell(cell(value(u, c.claim().valueInternal(), c.claim().dimension()) + (written.isEmpty() ? "" : "\n(" + written + ")"),
                        f, shade));
                t.addCell(cell(value(u, c.computed(), c.claim().dimension()), f, shade));
                t.addCell(cell(Double.isFinite(c.computedForce()) ? value(u, c.computedForce(), c.claim().dimension()) : "not run", f, shade));
                t.addCell(cell(Console.pct(c.relativeDifference()), f, shade));
                t.addCell(cell(Console.pct(c.tolerance().relative()) + " " + shortWhy(c.tolerance().why()), small, shade));
                t.addCell(cell(c.status().word.toUpperCase(Locale.ROOT), f, shade));
                String gov = LimitState.isEnvelope(c.claim().combo()) || c.governing().contains(" with loads on ") ? "governs: " + c.governing() : "";
                String diagnosis = c.explanation() > 0
                        ? "E" + c.explanation() + " (below)" + (c.ownDiagnosis() != null ? "; this claim alone: " + c.ownDiagnosis() : "")
                        : c.ownDiagnosis() != null ? c.ownDiagnosis()
                        : c.status() != ClaimResult.Status.OK ? "not explained by any change tried" : gov;
                t.addCell(cell(diagnosis, small, shade));
            }
            doc.add(t);
        }
        explanations(doc);
    }

    /** What went wrong with the claim set as a whole: the explanations, each with the claims that support it. */
    private void explanations(Document doc) throws DocumentException {
        if (review.claims().stream().allMatch(c -> c.status() == ClaimResult.Status.OK)) return;
        para(doc, "Explanations of the claim set", bold);
        if (review.explanations().isEmpty()) {
            para(doc, "No single change tried (a unit, a sign convention or a scale over the claims; a load case left out, "
                    + "doubled or scaled; a case missing from a combination; load factors left out; self-weight twice; "
                    + "pattern loading omitted; a support's fixity; a load on another member) brings two or more flagged "
                    + "claims, or every claim, within tolerance. The flagged claims need the originator's answer.", body);
            return;
        }
        para(doc, "Each change below was made once and every claim compared again (" + review.claims().size()
                + " claims). A change is a lead for the originator, not a finding: the count of claims it explains is the "
                + "evidence for it.", body);
        for (int i = 0; i < review.explanations().size(); i++) {
            var e = review.explanations().get(i);
            para(doc, "E" + (i + 1) + "  " + e.sentence() + " (" + e.support() + ")"
                    + (e.breaks().isEmpty() ? "" : "; it would break " + String.join(", ", e.breaks())), small);
        }
    }

    /** Where a tolerance came from, in a word for the table (the JSON keeps the full reason). */
    static String shortWhy(String why) {
        if (why.startsWith("default")) return "(default)";
        if (why.startsWith("claims file")) return "(file)";
        if (why.startsWith("set on")) return "(claim)";
        return "(" + why + ")";
    }

    static String factors(LoadSet s) {
        List<String> parts = new ArrayList<>();
        for (var e : s.factors().entrySet()) parts.add(String.format(Locale.ROOT, "%.4g %s", e.getValue(), e.getKey()));
        return String.join(" + ", parts);
    }

    private void queries(Document doc, Model m) throws DocumentException {
        heading(doc, "5  Queries for the originator");
        List<ClaimResult> flagged = review.claims().stream().filter(c -> c.status() != ClaimResult.Status.OK).toList();
        List<ClaimedEquilibrium> off = review.equilibrium().stream().filter(e -> !e.balanced()).toList();
        if (flagged.isEmpty() && off.isEmpty()) {
            para(doc, "None.", body);
            return;
        }
        UnitSystem u = m.units();
        PdfPTable t = table(new float[]{0.5f, 4.5f, 3f}, "No.", "Query", "Originator's response");
        int k = 1;
        for (ClaimResult c : flagged) {
            String q = String.format(Locale.ROOT, "%s: claimed %s, computed %s (%s). %s", label(c.claim()),
                    value(u, c.claim().valueInternal(), c.claim().dimension()), value(u, c.computed(), c.claim().dimension()),
                    Console.pct(c.relativeDifference()), c.diagnosis() == null ? "Please confirm the value and how it was found."
                            : "Possible cause: " + c.diagnosis() + ". Please confirm or correct.");
            t.addCell(cell("Q" + k++, smallBold, null));
            t.addCell(cell(q, small, null));
            PdfPCell space = cell(" ", small, null);
            space.setMinimumHeight(42);
            t.addCell(space);
        }
        for (ClaimedEquilibrium e : off) {
            t.addCell(cell("Q" + k++, smallBold, null));
            t.addCell(cell("The claimed reactions of " + e.combo() + " do not balance the applied loads (see section 3). Please "
                    + "check the load total and the reactions.", small, null));
            PdfPCell space = cell(" ", small, null);
            space.setMinimumHeight(42);
            t.addCell(space);
        }
        doc.add(t);
    }

    private void diagrams(Document doc, PdfWriter writer, Model m) throws DocumentException {
        Analysis a = review.analysis();
        if (!a.stable()) return;
        heading(doc, "6  Diagrams for the governing load sets");
        para(doc, "Stiffness-method results. Moment is drawn on the tension face (positive, sagging, towards each member's "
                + "local -y side); axial and shear force are drawn positive on the local +y side (above a beam drawn left to "
                + "right). Each member's largest and smallest values are labelled in "
                + m.units().force().symbol() + " and " + m.units().length().symbol() + ".", body);
        for (String name : DrawnLoadSets.choose(review)) {
            LoadSetResult r = a.solutions().get(a.primaryEngine()).get(name);
            Solution s = r.representative();
            para(doc, "Load set " + name + (r.patterned() ? " (every patterned load on; tabulated peaks are the envelope's)" : ""), bold);
            for (Drawings.Kind k : Drawings.Kind.values()) {
                if (Drawings.blank(m, s, k)) continue; // e.g. shear and moment of a truss under joint loads
                // caption and picture kept on one page
                PdfPTable box = new PdfPTable(1);
                box.setWidthPercentage(100);
                box.setKeepTogether(true);
                PdfPCell cap = new PdfPCell(new Phrase(k.title + " - " + name, small));
                cap.setBorder(Rectangle.NO_BORDER);
                box.addCell(cap);
                PdfPCell pic = new PdfPCell(picture(writer, 499, 150, g -> Drawings.diagram(g, m, s, k, 499, 150)), true);
                pic.setBorder(Rectangle.NO_BORDER);
                box.addCell(pic);
                box.setSpacingAfter(4);
                doc.add(box);
            }
        }
    }

    private void working(Document doc) throws DocumentException {
        EngineResult force = review.analysis().engines().get("force");
        heading(doc, "7  Force-method working");
        if (force == null || force.declined() || !force.stable()) {
            String why = force == null ? String.join("; ", notes) : force.instability();
            para(doc, "The force method was not run for this model" + (why == null || why.isEmpty() ? "." : ": " + why), body);
            return;
        }
        var w = force.working();
        for (String n : force.notes()) para(doc, n, small);
        if (w == null || !w.listed()) {
            if (w != null) for (String n : w.lines()) para(doc, n, small); // the size of a matrix too large to list
            return;
        }
        List<String> red = w.redundants();
        para(doc, "Flexibility coefficients delta_ij = sum of integral(m_i m_j / EI + n_i n_j / EA) + 1/k of springs, "
                + "in SI units (m/N, rad/N, m/(N*m), rad/(N*m)); redundant i is a unit force or moment:", body);
        float[] widths = new float[red.size() + 1];
        Arrays.fill(widths, 1f);
        widths[0] = 1.2f;
        String[] heads = new String[red.size() + 1];
        heads[0] = "delta_ij";
        for (int i = 0; i < red.size(); i++) heads[i + 1] = red.get(i);
        PdfPTable t = table(widths, heads);
        for (int i = 0; i < red.size(); i++) {
            t.addCell(cell(red.get(i), smallBold, null));
            for (int j = 0; j < red.size(); j++) t.addCell(cell(String.format(Locale.ROOT, "%.5g", w.flexibility()[i][j]), small, null));
        }
        doc.add(t);
        para(doc, "Compatibility: delta z + Delta_0 = 0 per load case; Delta_i0 is the displacement of the released "
                + "structure at redundant i under the case's loads, temperatures and settlements; z the redundant values (N, N*m):", body);
        String[] heads2 = new String[2 * red.size() + 1];
        heads2[0] = "Load case";
        for (int i = 0; i < red.size(); i++) {
            heads2[1 + i] = "Delta_0 " + red.get(i);
            heads2[1 + red.size() + i] = red.get(i);
        }
        float[] w2 = new float[2 * red.size() + 1];
        Arrays.fill(w2, 1f);
        PdfPTable t2 = table(w2, heads2);
        for (var e : w.deltaZero().entrySet()) {
            t2.addCell(cell(e.getKey(), smallBold, null));
            for (double d : e.getValue()) t2.addCell(cell(String.format(Locale.ROOT, "%.5g", d), small, null));
            for (double z : w.values().get(e.getKey())) t2.addCell(cell(String.format(Locale.ROOT, "%.5g", z), small, null));
        }
        doc.add(t2);
    }

    private void warnings(Document doc) throws DocumentException {
        heading(doc, "8  Plausibility warnings");
        if (review.warnings().isEmpty()) {
            para(doc, "None: the input values lie within the usual ranges checked (common practice).", body);
            return;
        }
        PdfPTable t = table(new float[]{2f, 3f, 3f}, "Where", "Found", "Rule of thumb");
        for (var w : review.warnings()) {
            t.addCell(cell(w.subject(), small, null));
            t.addCell(cell(w.message(), small, null));
            t.addCell(cell(w.rule(), small, null));
        }
        doc.add(t);
    }

    private void cautions(Document doc) throws DocumentException {
        heading(doc, "9  Assumptions and cautions");
        String[] items = {
                "Linear elastic material, small displacements and rotations (first-order analysis); no buckling, P-delta, "
                        + "cracking, yielding or dynamic effects.",
                "Plane members on their centroidal axes, Euler-Bernoulli bending (no shear deformation), rigid joints unless "
                        + "hinged, supports exactly as modelled.",
                "Loads as given in the model; combinations as listed, standard combination factors as recalled from the "
                        + "standards named, to be confirmed against the edition in force.",
                "Tolerances are those stated per claim; a claim within tolerance is consistent with this model, not proven right.",
                CAUTION,
        };
        for (String s : items) para(doc, "-  " + s, body);
    }

    private void signOff(Document doc, Model m) throws DocumentException {
        heading(doc, "10  Sign-off");
        PdfPTable t = new PdfPTable(new float[]{1.4f, 2.3f, 1.4f, 1.6f});
        t.setWidthPercentage(100);
        t.setKeepTogether(true);
        String[][] rows = {{"Checked by", m.job().checker()}, {"Originator", m.job().originator()}, {"Reviewed by", ""}};
        for (String[] r : rows) {
            t.addCell(cell(r[0], smallBold, null));
            PdfPCell name = cell(r[1], small, null);
            name.setMinimumHeight(30);
            t.addCell(name);
            t.addCell(cell("Signature / date", smallBold, null));
            t.addCell(cell(" ", small, null));
        }
        doc.add(t);
    }
}
