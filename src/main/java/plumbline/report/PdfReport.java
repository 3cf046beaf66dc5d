package plumbline.report;

import java.awt.Color;
import java.io.ByteArrayOutputStream;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import com.lowagie.text.Chunk;
import com.lowagie.text.Document;
import com.lowagie.text.DocumentException;
import com.lowagie.text.PageSize;
import com.lowagie.text.Paragraph;
import com.lowagie.text.pdf.PdfPCell;
import com.lowagie.text.pdf.PdfPTable;
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
import plumbline.statics.EquilibriumMatrix;
import plumbline.units.Dimension;
import plumbline.units.UnitSystem;
import static plumbline.report.PdfKit.Style.BODY;
import static plumbline.report.PdfKit.Style.BOLD;
import static plumbline.report.PdfKit.Style.SMALL;
import static plumbline.report.PdfKit.Style.SMALL_BOLD;

/**
 * The discrepancy report a checker attaches to a calculation package: title block,
 * summary, the model as checked (sketches with values and dimensions, and the input echo),
 * statics, equilibrium of the claims, the comparison, queries for the originator,
 * diagrams, the force-method working, warnings, cautions and a sign-off block. The only
 * classes that use OpenPDF are this one, {@link PdfKit} (page furniture) and
 * {@link ModelEcho} (the input tables). Flagged rows are shaded, set in bold and marked
 * with "!!" or "?" so a grey-scale print still shows them; every page's footer carries
 * the caution.
 *
 * Over 400 lines because it writes every section of the report in order, one method a
 * section; the furniture, the input echo and the drawings are in their own classes.
 */
public final class PdfReport {

    static final String CAUTION = "This is an independent check of a simplified, linear-elastic, small-displacement plane model "
            + "against the numbers claimed for it. It does not replace the engineer of record, licensed review or the local "
            + "codes, and agreement with the claims does not show that the model represents the structure.";

    /** Load cases drawn with their loads in the model section, beyond which the load table alone gives them. */
    static final int CASES_DRAWN = 6;

    private final Review review;
    private final ResultsTree.Inputs inputs;
    private final Double agreement;
    private final List<String> notes;
    private final LocalDate date;
    private PdfKit kit;

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

    static String jobTitle(Model m) {
        return m.job().title().isEmpty() ? m.file() : m.job().title();
    }

    private byte[] build() throws DocumentException {
        Model m = review.analysis().model();
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        Document doc = new Document(PageSize.A4, 48, 48, 48, 72);
        PdfWriter writer = PdfWriter.getInstance(doc, out);
        writer.setPageEvent(new PdfKit.Footer("Plumbline " + ResultsTree.TOOL_VERSION + " discrepancy report - " + jobTitle(m)));
        doc.addTitle("Plumbline discrepancy report: " + jobTitle(m));
        doc.addCreator("Plumbline " + ResultsTree.TOOL_VERSION);
        doc.open();
        kit = new PdfKit(doc, writer);
        titleBlock(m);
        summary();
        model(m);
        statics(m);
        equilibrium(m);
        comparison(m);
        queries(m);
        diagrams(m);
        working();
        warnings();
        cautions();
        signOff(m);
        doc.close();
        return out.toByteArray();
    }

    private void titleBlock(Model m) throws DocumentException {
        Paragraph p = new Paragraph(PdfKit.phrase("Independent check - discrepancy report", PdfKit.Style.TITLE));
        p.setSpacingAfter(2);
        kit.doc.add(p);
        kit.para(jobTitle(m), BOLD);
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
                {"Units", m.units().force().symbol() + ", " + m.units().length().symbol() + " and their products; displacements in "
                        + Shown.unit(m.units(), Dimension.LENGTH)},
        };
        for (String[] r : rows) {
            t.addCell(PdfKit.cell(r[0], SMALL_BOLD, null));
            t.addCell(PdfKit.cell(r[1].isEmpty() ? "-" : r[1], SMALL, null));
        }
        for (int i = 0; i < inputs.files().size(); i++) {
            t.addCell(PdfKit.cell(i == 0 ? "Input files (SHA-256)" : "", SMALL_BOLD, null));
            t.addCell(PdfKit.cell(inputs.files().get(i) + "  " + inputs.sha256().get(i), SMALL, null));
        }
        kit.doc.add(t);
        kit.para("Caution: " + CAUTION, SMALL);
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

    private List<ClaimResult> flagged() {
        return review.claims().stream().filter(c -> c.status() != ClaimResult.Status.OK).toList();
    }

    private void summary() throws DocumentException {
        kit.heading("Summary");
        long ok = count(ClaimResult.Status.OK), mg = count(ClaimResult.Status.MARGINAL), mm = count(ClaimResult.Status.MISMATCH);
        // the paragraph takes the first phrase's font, which its spacing is set in (no other font referenced)
        Paragraph v = new Paragraph(PdfKit.phrase("Verdict: " + review.verdict().word.toUpperCase(Locale.ROOT), PdfKit.Style.VERDICT));
        v.add(new Chunk("      ", PdfKit.phrase(" ", BODY).getFont()));
        v.add(PdfKit.phrase(String.format(Locale.ROOT, "%d claims: %d ok, %d marginal, %d mismatch", ok + mg + mm, ok, mg, mm), BODY));
        v.setSpacingAfter(2);
        kit.doc.add(v);
        kit.para("The verdict means: " + review.verdict().meaning(), review.verdict().flagged ? BOLD : BODY);
        Determinacy.Result d = review.analysis().determinacy();
        kit.para("Statics: " + d.classification().word + (d.classification() == Determinacy.Classification.INDETERMINATE
                ? " to degree " + d.degree() : "") + (d.mechanisms() > 0 ? ", " + d.mechanisms() + " mechanism(s)" : "")
                + ". " + solvedLine(), BODY);
        long unbalanced = review.equilibrium().stream().filter(e -> !e.balanced()).count();
        if (unbalanced > 0) kit.para("Claimed reactions out of balance in " + unbalanced + " combination(s): see section 3.", BOLD);
        List<ClaimResult> worst = new ArrayList<>(flagged());
        worst.sort((a, b) -> Double.compare(b.relativeDifference(), a.relativeDifference()));
        if (worst.isEmpty()) {
            kit.para(review.claims().isEmpty() ? "No claims were given, so nothing was compared."
                    : "No claim differs from the computed value by more than its tolerance.", BODY);
            return;
        }
        kit.caption("Largest discrepancies:");
        PdfPTable t = PdfKit.table(new float[]{0.65f, 2.2f, 1.1f, 1.1f, 0.8f, 4.15f}, "Query", "Claim", "Claimed", "Computed", "Diff.", "Likely cause");
        UnitSystem u = review.analysis().model().units();
        List<ClaimResult> all = flagged();
        for (int i = 0; i < Math.min(6, worst.size()); i++) {
            ClaimResult c = worst.get(i);
            Color shade = shade(c);
            String[] pair = Shown.pair(review.analysis().model(), c);
            t.addCell(PdfKit.cell("Q" + (all.indexOf(c) + 1), SMALL_BOLD, shade));
            t.addCell(PdfKit.cell(label(c.claim()), SMALL_BOLD, shade));
            t.addCell(PdfKit.cell(pair[0], SMALL_BOLD, shade));
            t.addCell(PdfKit.cell(pair[1], SMALL_BOLD, shade));
            t.addCell(PdfKit.cell(Shown.difference(u, c), SMALL_BOLD, shade));
            t.addCell(PdfKit.cell(c.diagnosis() == null ? "no single slip explains it: query the originator" : c.diagnosis(), SMALL, shade));
        }
        kit.doc.add(t);
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
        return c.status() == ClaimResult.Status.MISMATCH ? PdfKit.SHADE_MISMATCH
                : c.status() == ClaimResult.Status.MARGINAL ? PdfKit.SHADE_MARGINAL : null;
    }

    static String label(Claim c) {
        return c.item().word + " " + c.name() + " " + c.quantity() + " (" + c.combo() + ")";
    }

    /** Section 2: the sketch with the first case's loads, the other cases' loads, then the input echo. */
    private void model(Model m) throws DocumentException {
        kit.heading("The model as checked", 330); // the heading, a line and the sketch with its legend
        kit.para(String.format(Locale.ROOT, "%d nodes, %d members, %d supports, %d load cases, %d load sets checked.",
                m.nodes().size(), m.members().size(), m.supports().size(), m.loadCases().size(),
                review.analysis().loadSets().size()), BODY);
        boolean loadsDrawn = m.members().size() <= Sketch.LOAD_LIMIT && !m.loadCases().isEmpty();
        LoadCase first = loadsDrawn ? m.loadCases().get(0) : null;
        String legend = "Symbols: wedge = pinned support, wedge on rollers = roller, bar with hatching = fixed support, zigzag "
                + "= spring, open circle = hinge (or truss member end), arrow head on a member = its direction (start to end, "
                + "local x), arrows off the members = loads with their values (" + m.units().force().symbol() + ", "
                + m.units().symbol(Dimension.FORCE_PER_LENGTH) + ", " + m.units().symbol(Dimension.MOMENT) + "); dimensions in "
                + m.units().length().symbol() + "."
                + (m.members().size() > Sketch.LABEL_LIMIT ? " Names, values and dimensions are left out of the drawings of a model "
                + "this size; the tables carry them." : "")
                + (m.members().size() > Sketch.LOAD_LIMIT ? " Loads are not drawn at this size; the load table gives them." : "");
        kit.figure(first == null ? "The model" : "The model with the loads of load case " + first.name() + " (" + first.type()
                + (first.pattern() ? ", pattern loaded" : "") + ")", kit.picture(499, 230, g -> Sketch.model(g, m, first, 499, 230)), legend);
        if (loadsDrawn) {
            List<LoadCase> more = m.loadCases().subList(1, Math.min(CASES_DRAWN, m.loadCases().size()));
            for (LoadCase c : more) {
                kit.figure("Loads of load case " + c.name() + " (" + c.type() + (c.pattern() ? ", pattern loaded" : "") + ")",
                        kit.picture(499, 180, g -> Sketch.model(g, m, c, 499, 180)), null);
            }
            if (m.loadCases().size() > CASES_DRAWN) kit.para("The loads of the other " + (m.loadCases().size() - CASES_DRAWN)
                    + " load cases are given in the load table below.", SMALL);
        }
        new ModelEcho(kit, m).write(review.analysis().loadSets());
    }

    private void statics(Model m) throws DocumentException {
        kit.heading("Determinacy, stability and equilibrium");
        Determinacy.Result d = review.analysis().determinacy();
        kit.para(String.format(Locale.ROOT, "Classification by the rank of the equilibrium matrix: %s. Equations %d, unknown "
                        + "forces %d, rank %d; degree of static indeterminacy %d; mechanisms %d. The counting formula "
                        + "(unknowns less equations) gives %d.", d.classification().word, d.equations(), d.unknowns(), d.rank(),
                d.degree(), d.mechanisms(), d.countingDegree()), BODY);
        if (!d.remark().isEmpty()) kit.para(d.remark(), BOLD);
        EngineResult force = review.analysis().engines().get("force");
        if (force != null && force.stable() && !force.notes().isEmpty()) kit.para("Force method " + force.notes().get(0) + ".", BODY);
        int k = 1;
        for (Determinacy.Mechanism mech : d.shapes()) {
            String caption = "Mechanism " + k + ": " + mech.description() + ".";
            if (k++ <= 3) kit.figure(caption, kit.picture(499, 160, g -> Sketch.mechanism(g, m, mech.motion(), 499, 160)), null);
            else kit.para(caption, BOLD);
        }
    }

    private void equilibrium(Model m) throws DocumentException {
        UnitSystem u = m.units();
        kit.caption("Equilibrium of the claimed reactions (sums of the claimed reactions and the applied loads; moments about "
                + "the first support; flagged beyond " + Shown.tolerancePercent(ClaimedEquilibrium.DEFAULT_TOLERANCE)
                + " of the applied load, common practice):");
        if (review.equilibrium().isEmpty()) {
            kit.para("No reactions are claimed.", BODY);
            return;
        }
        PdfPTable t = PdfKit.table(new float[]{1.3f, 1.1f, 1.1f, 1.3f, 1f, 3.4f}, "Load set", "Sum Fx", "Sum Fy", "Sum M", "Status", "Note");
        for (ClaimedEquilibrium e : review.equilibrium()) {
            Color shade = e.balanced() ? null : PdfKit.SHADE_MISMATCH;
            PdfKit.Style f = e.balanced() ? SMALL : SMALL_BOLD;
            t.addCell(PdfKit.cell(e.combo(), f, shade));
            t.addCell(PdfKit.cell(e.checkedFx() ? Shown.sum(u, e.sumFxN(), e.relFx(), Dimension.FORCE) : "-", f, shade));
            t.addCell(PdfKit.cell(e.checkedFy() ? Shown.sum(u, e.sumFyN(), e.relFy(), Dimension.FORCE) : "-", f, shade));
            t.addCell(PdfKit.cell(e.checkedMoment() ? Shown.sum(u, e.sumMomentNm(), e.relMoment(), Dimension.MOMENT)
                    + " about " + e.referenceNode() : "-", f, shade));
            t.addCell(PdfKit.cell(!e.checkedFx() && !e.checkedFy() && !e.checkedMoment() ? "not checked" : e.balanced() ? "balanced"
                    : "!! OUT OF BALANCE", f, shade));
            t.addCell(PdfKit.cell(e.note(), SMALL, shade));
        }
        kit.doc.add(t);
    }

    private void comparison(Model m) throws DocumentException {
        int given = m.claims().stream().mapToInt(cs -> cs.claims().size()).sum();
        if (given == 0) {
            results(m);
            return;
        }
        kit.heading("Claims compared");
        kit.para("Each claim against the stiffness-method and force-method values. Difference relative to the computed "
                + "value; where the computed value is no larger than the absolute floor (a small fraction of the largest value "
                + "of its kind, below which a relative difference means nothing) the difference is given in units and judged "
                + "against the floor. Tolerances and where they come from: (default) reactions 3%, member forces 5%, "
                + "deflections 10% (common practice), (file) set in the claims file, (claim) set on the claim, (--tolerance) "
                + "set by the checker. Displacements in " + Shown.unit(m.units(), Dimension.LENGTH) + ", with the span ratio of a "
                + "member's deflection. Rows marked !! are mismatches, ? marginal.", BODY);
        UnitSystem u = m.units();
        if (!review.analysis().stable()) {
            kit.para("The model is unstable, so none of the " + given + " claims can be compared: correct the supports or "
                    + "releases (section 3) and check again.", BOLD);
        }
        Set<String> combos = new LinkedHashSet<>();
        for (ClaimResult c : review.claims()) combos.add(c.claim().combo());
        for (String combo : combos) {
            LoadSet set = review.analysis().loadSets().stream().filter(s -> s.name().equals(combo)).findFirst().orElse(null);
            LimitState state = LimitState.ofEnvelope(combo);
            String envelope = state == LimitState.NONE ? "envelope over all combinations" : "envelope over the " + state + " combinations";
            kit.caption(combo + (set != null ? "  -  " + set.origin() + ": " + factors(set) : "  -  " + envelope));
            PdfPTable t = PdfKit.table(new float[]{0.3f, 1.75f, 1.2f, 1.15f, 1.15f, 0.8f, 1.1f, 1.25f, 2.3f},
                    "", "Quantity", "Claimed", "Stiffness", "Force", "Diff.", "Tolerance", "Status", "Diagnosis / governing");
            for (ClaimResult c : review.claims()) {
                if (!c.claim().combo().equals(combo)) continue;
                Color shade = shade(c);
                PdfKit.Style f = c.status() == ClaimResult.Status.OK ? SMALL : SMALL_BOLD;
                String mark = c.status() == ClaimResult.Status.MISMATCH ? "!!" : c.status() == ClaimResult.Status.MARGINAL ? "?" : "";
                t.addCell(PdfKit.cell(mark, f, shade));
                t.addCell(PdfKit.cell(c.claim().item().word + " " + c.claim().name() + " " + Console.quantityLabel(c.claim(), u), f, shade));
                String written = Console.asWritten(c.claim(), u);
                String[] pair = Shown.pair(m, c);
                t.addCell(PdfKit.cell(pair[0] + (written.isEmpty() ? "" : "\n(" + written + ")"), f, shade));
                t.addCell(PdfKit.cell(pair[1], f, shade));
                t.addCell(PdfKit.cell(Double.isFinite(c.computedForce()) ? pair[2] : "not run", f, shade));
                t.addCell(PdfKit.cell(Shown.difference(u, c), f, shade));
                t.addCell(PdfKit.cell(Shown.byFloor(c) ? Shown.tolerance(u, c) : Shown.tolerance(u, c) + " " + shortWhy(c.tolerance().why()), SMALL, shade));
                t.addCell(PdfKit.cell(c.status().word.toUpperCase(Locale.ROOT), f, shade));
                String gov = LimitState.isEnvelope(c.claim().combo()) || c.governing().contains(" with loads on ") ? "governs: " + c.governing() : "";
                String diagnosis = c.explanation() > 0
                        ? "E" + c.explanation() + " (below)" + (c.ownDiagnosis() != null ? "; this claim alone: " + c.ownDiagnosis() : "")
                        : c.ownDiagnosis() != null ? c.ownDiagnosis()
                        : c.status() != ClaimResult.Status.OK ? "not explained by any change tried" : gov;
                t.addCell(PdfKit.cell(diagnosis, SMALL, shade));
            }
            kit.doc.add(t);
        }
        explanations();
    }

    /**
     * Section 4 of a model with no claims: the computed reactions and member peaks of each
     * load set, for the checker to compare by hand (the JSON, when asked for, has them all).
     */
    private void results(Model m) throws DocumentException {
        kit.heading("Computed results (no claims were given)");
        Analysis a = review.analysis();
        if (!a.stable()) {
            kit.para("The model is unstable, so there are no results to list: correct the supports or releases (section 3) "
                    + "and check again.", BOLD);
            return;
        }
        boolean small = m.members().size() <= Sketch.LABEL_LIMIT && a.loadSets().size() <= 24;
        kit.para("No claims were given, so nothing is compared. " + (small
                ? "The stiffness-method reactions and member peaks of every load set follow, for comparison by hand."
                : "The model is too large to list its results here (" + m.members().size() + " members, " + a.loadSets().size()
                + " load sets); write them with --json."), BODY);
        if (!small) return;
        UnitSystem u = m.units();
        String f = u.force().symbol(), mo = u.symbol(Dimension.MOMENT), d = Shown.unit(u, Dimension.LENGTH);
        for (LoadSet s : a.loadSets()) {
            LoadSetResult r = a.solutions().get(a.primaryEngine()).get(s.name());
            kit.caption("Load set " + s.name() + (r.patterned() ? " (envelope over the pattern arrangements: upper / lower)" : ""));
            PdfPTable t = PdfKit.table(new float[]{1.4f, 1.5f, 1.5f, 1.5f}, "Reaction at", "Fx (" + f + ")", "Fy (" + f + ")", "Mz (" + mo + ")");
            for (var sup : m.supports().values()) {
                t.addCell(PdfKit.cell(sup.node(), SMALL, null));
                for (int c = 0; c < 3; c++) {
                    Dimension dim = c == 2 ? Dimension.MOMENT : Dimension.FORCE;
                    String v = !sup.reacts(c) ? "-" : r.patterned()
                            ? Console.fmt(Shown.value(u, r.reaction(sup.node(), c, true), dim)) + " / "
                            + Console.fmt(Shown.value(u, r.reaction(sup.node(), c, false), dim))
                            : Console.fmt(Shown.value(u, r.reaction(sup.node(), c, true), dim));
                    t.addCell(PdfKit.cell(v, SMALL, null));
                }
            }
            kit.doc.add(t);
            PdfPTable p = PdfKit.table(new float[]{1.2f, 1.2f, 1.2f, 1.2f, 1.2f, 1.2f, 1.6f}, "Member", "N max (" + f + ")",
                    "N min (" + f + ")", "V abs (" + f + ")", "M max (" + mo + ")", "M min (" + mo + ")", "Deflection (" + d + ")");
            for (var mem : m.members().values()) {
                p.addCell(PdfKit.cell(mem.name(), SMALL, null));
                for (Quantity q : new Quantity[]{Quantity.N_MAX, Quantity.N_MIN, Quantity.V_ABS, Quantity.M_MAX, Quantity.M_MIN}) {
                    p.addCell(PdfKit.cell(Console.fmt(Shown.value(u, r.peak(mem.name(), q).value(), q.dimension)), SMALL, null));
                }
                double defl = r.peak(mem.name(), Quantity.DEFLECTION).value();
                String ratio = Shown.spanRatio(defl, m.lengthM(mem));
                p.addCell(PdfKit.cell(Console.fmt(Shown.value(u, defl, Dimension.LENGTH)) + (ratio.isEmpty() ? "" : " (" + ratio + ")"), SMALL, null));
            }
            kit.doc.add(p);
        }
    }

    /** What went wrong with the claim set as a whole: the explanations, each with the claims that support it. */
    private void explanations() throws DocumentException {
        if (review.claims().stream().allMatch(c -> c.status() == ClaimResult.Status.OK)) return;
        kit.caption("Explanations of the claim set");
        if (review.explanations().isEmpty()) {
            kit.para("No single change tried (a unit, a sign convention or a scale over the claims; a load case left out, "
                    + "doubled or scaled; a case missing from a combination; load factors left out; self-weight twice; "
                    + "pattern loading omitted; a support's fixity; a load on another member) brings two or more flagged "
                    + "claims, or every claim, within tolerance. The flagged claims need the originator's answer.", BODY);
            return;
        }
        kit.para("Each change below was made once and every claim compared again (" + review.claims().size()
                + " claims). A change is a lead for the originator, not a finding: the count of claims it explains is the "
                + "evidence for it.", BODY);
        for (int i = 0; i < review.explanations().size(); i++) {
            var e = review.explanations().get(i);
            kit.para("E" + (i + 1) + "  " + e.sentence() + " (" + e.support() + ")"
                    + (e.breaks().isEmpty() ? "" : "; it would break " + String.join(", ", e.breaks())), SMALL);
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
        for (var e : s.factors().entrySet()) parts.add(Console.fmt(e.getValue()).replaceAll("\\.?0+$", "") + " " + e.getKey());
        return String.join(" + ", parts);
    }

    private void queries(Model m) throws DocumentException {
        kit.heading("Queries for the originator");
        List<ClaimResult> flagged = flagged();
        List<ClaimedEquilibrium> off = review.equilibrium().stream().filter(e -> !e.balanced()).toList();
        if (flagged.isEmpty() && off.isEmpty()) {
            kit.para("None.", BODY);
            return;
        }
        UnitSystem u = m.units();
        PdfPTable t = PdfKit.table(new float[]{0.5f, 4.5f, 3f}, "No.", "Query", "Originator's response");
        int k = 1;
        for (ClaimResult c : flagged) {
            String[] pair = Shown.pair(m, c);
            String q = String.format(Locale.ROOT, "%s: claimed %s, computed %s (%s). %s", label(c.claim()), pair[0], pair[1],
                    Shown.difference(u, c), c.diagnosis() == null ? "Please confirm the value and how it was found."
                            : "Possible cause: " + c.diagnosis() + ". Please confirm or correct.");
            query(t, k++, q);
        }
        for (ClaimedEquilibrium e : off) {
            query(t, k++, "The claimed reactions of " + e.combo() + " do not balance the applied loads (see section 3). Please "
                    + "check the load total and the reactions.");
        }
        kit.doc.add(t);
    }

    private static void query(PdfPTable t, int k, String q) {
        t.addCell(PdfKit.cell("Q" + k, SMALL_BOLD, null));
        t.addCell(PdfKit.cell(q, SMALL, null));
        PdfPCell space = PdfKit.cell(" ", SMALL, null);
        space.setMinimumHeight(42);
        t.addCell(space);
    }

    private void diagrams(Model m) throws DocumentException {
        Analysis a = review.analysis();
        if (!a.stable()) return;
        kit.heading("Diagrams of the load sets", 300); // the heading, the legend and the first diagram
        DrawnLoadSets.Choice choice = DrawnLoadSets.choose(review);
        kit.para("Stiffness-method results, drawn for " + choice.why() + ". Moment is drawn on the tension face (positive, "
                + "sagging, towards each member's local -y side); axial and shear force are drawn positive on the local +y side "
                + "(above a beam drawn left to right). Each member's largest and smallest values are labelled in "
                + m.units().force().symbol() + " and " + m.units().symbol(Dimension.MOMENT) + ", displacements in "
                + Shown.unit(m.units(), Dimension.LENGTH) + ". A pattern-loaded set is drawn as its envelope (upper and lower "
                + "curves over every arrangement), the values the tables give.", BODY);
        for (String name : choice.names()) {
            LoadSetResult r = a.solutions().get(a.primaryEngine()).get(name);
            Solution s = r.representative();
            boolean captioned = false;
            for (Diagrams.Kind k : Diagrams.Kind.values()) {
                if (Diagrams.blank(m, s, k)) continue; // e.g. shear and moment of a truss under joint loads
                String caption = (captioned ? "" : "Load set " + name + (r.patterned() ? " (envelope over the pattern arrangements)" : "")
                        + ": ") + k.title + (r.patterned() && k == Diagrams.Kind.DEFLECTION ? "; envelope of the transverse deflection" : "");
                captioned = true;
                String[] note = {""};
                float h = Diagrams.height(m);
                var picture = kit.picture(499, h, g -> note[0] = Diagrams.diagram(g, m, r, k, 499, h, false));
                kit.figure(caption, picture, note[0].isEmpty() ? null : note[0]);
            }
        }
    }

    private void working() throws DocumentException {
        EngineResult force = review.analysis().engines().get("force");
        kit.heading("Force-method working");
        if (force == null || force.declined() || !force.stable()) {
            String why = force == null ? String.join("; ", notes) : force.instability();
            kit.para("The force method was not run for this model" + (why == null || why.isEmpty() ? "." : ": " + why), BODY);
            return;
        }
        var w = force.working();
        for (String n : force.notes()) kit.para(n, SMALL);
        if (w == null || !w.listed()) {
            if (w != null) for (String n : w.lines()) kit.para(n, SMALL); // the size of a matrix too large to list
            return;
        }
        UnitSystem u = review.analysis().model().units();
        List<String> red = w.redundants();
        int n = red.size();
        double[][] flex = new double[n][n];
        double largest = 0;
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                // displacement at i (a length, or a rotation for a moment) per unit redundant j (a force or a moment)
                flex[i][j] = u.fromInternal(w.flexibility()[i][j], new Dimension(-1, (moment(red.get(i)) ? 0 : 1) - (moment(red.get(j)) ? 1 : 0), 0, 0));
                largest = Math.max(largest, Math.abs(flex[i][j]));
            }
        }
        int exp = largest == 0 ? 0 : (int) Math.floor(Math.log10(largest));
        String f = u.force().symbol(), l = u.length().symbol();
        kit.caption("Flexibility coefficients delta_ij = sum of integral(m_i m_j / EI + n_i n_j / EA) + 1/k of springs: the "
                + "displacement at redundant i per unit redundant j, in " + l + "/" + f + " (force-force), rad/" + f + " or "
                + l + "/(" + f + "*" + l + ") (mixed), rad/(" + f + "*" + l + ") (moment-moment); every entry x 10^" + exp + ":");
        float[] widths = new float[n + 1];
        Arrays.fill(widths, 1f);
        widths[0] = 1.2f;
        String[] heads = new String[n + 1];
        heads[0] = "delta_ij";
        for (int i = 0; i < n; i++) heads[i + 1] = red.get(i);
        PdfPTable t = PdfKit.table(widths, heads);
        for (int i = 0; i < n; i++) {
            t.addCell(PdfKit.cell(red.get(i), SMALL_BOLD, null));
            for (int j = 0; j < n; j++) t.addCell(PdfKit.cell(Console.fmt(flex[i][j] / Math.pow(10, exp)), SMALL, null));
        }
        kit.doc.add(t);
        kit.caption("Compatibility: delta z + Delta_0 = 0 per load case; Delta_i0 is the displacement of the released "
                + "structure at redundant i under the case's loads, temperatures and settlements (" + l + " or rad); z the "
                + "redundant values (" + f + " or " + u.symbol(Dimension.MOMENT) + "):");
        String[] heads2 = new String[2 * n + 1];
        heads2[0] = "Load case";
        for (int i = 0; i < n; i++) {
            heads2[1 + i] = "Delta_0 " + red.get(i);
            heads2[1 + n + i] = red.get(i);
        }
        float[] w2 = new float[2 * n + 1];
        Arrays.fill(w2, 1f);
        PdfPTable t2 = PdfKit.table(w2, heads2);
        for (var e : w.deltaZero().entrySet()) {
            t2.addCell(PdfKit.cell(e.getKey(), SMALL_BOLD, null));
            double[] d0 = e.getValue(), z = w.values().get(e.getKey());
            for (int i = 0; i < n; i++) {
                t2.addCell(PdfKit.cell(Console.fmt(u.fromInternal(d0[i], moment(red.get(i)) ? Dimension.NONE : Dimension.LENGTH)), SMALL, null));
            }
            for (int i = 0; i < n; i++) {
                t2.addCell(PdfKit.cell(Console.fmt(u.fromInternal(z[i], moment(red.get(i)) ? Dimension.MOMENT : Dimension.FORCE)), SMALL, null));
            }
        }
        kit.doc.add(t2);
    }

    /** True for a redundant that is a moment (a member end moment or a support's moment). */
    static boolean moment(String redundant) {
        return EquilibriumMatrix.isMoment(redundant);
    }

    private void warnings() throws DocumentException {
        kit.heading("Plausibility warnings");
        if (review.warnings().isEmpty()) {
            kit.para("None: the input values lie within the usual ranges checked (common practice).", BODY);
            return;
        }
        PdfPTable t = PdfKit.table(new float[]{2f, 3f, 3f}, "Where", "Found", "Rule of thumb");
        for (var w : review.warnings()) {
            t.addCell(PdfKit.cell(w.subject(), SMALL, null));
            t.addCell(PdfKit.cell(w.message(), SMALL, null));
            t.addCell(PdfKit.cell(w.rule(), SMALL, null));
        }
        kit.doc.add(t);
    }

    private void cautions() throws DocumentException {
        kit.heading("Assumptions and cautions");
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
        for (String s : items) kit.para("-  " + s, BODY);
    }

    private void signOff(Model m) throws DocumentException {
        kit.heading("Sign-off");
        PdfPTable t = new PdfPTable(new float[]{1.4f, 2.3f, 1.4f, 1.6f});
        t.setWidthPercentage(100);
        t.setKeepTogether(true);
        String[][] rows = {{"Checked by", m.job().checker()}, {"Originator", m.job().originator()}, {"Reviewed by", ""}};
        for (String[] r : rows) {
            t.addCell(PdfKit.cell(r[0], SMALL_BOLD, null));
            PdfPCell name = PdfKit.cell(r[1], SMALL, null);
            name.setMinimumHeight(30);
            t.addCell(name);
            t.addCell(PdfKit.cell("Signature / date", SMALL_BOLD, null));
            t.addCell(PdfKit.cell(" ", SMALL, null));
        }
        kit.doc.add(t);
    }
}
