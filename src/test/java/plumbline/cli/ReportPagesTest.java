package plumbline.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javax.imageio.ImageIO;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.apache.pdfbox.text.TextPosition;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import plumbline.io.ModelReader;
import plumbline.model.LoadCase;
import plumbline.model.Member;
import plumbline.model.MemberLoad;
import plumbline.model.Model;
import plumbline.model.Node;
import plumbline.model.NodeLoad;
import plumbline.report.Console;
import plumbline.units.Dimension;

/**
 * The report read page by page, in reading order (PDFBox sorts the text by its place on
 * the page), as a checker reads it before attaching it to a calc package: every page
 * carries the caution and "page x of y"; no page ends on a section heading or a caption;
 * every node, member, section and load value of the model appears; names in Greek,
 * Cyrillic and Chinese come out exactly; no number prints in e-notation or as "-0".
 */
class ReportPagesTest {

    @TempDir
    Path tempDir;

    static final String FOOTER_CAUTION = "Independent check of a simplified linear-elastic model: it does not replace the "
            + "engineer of record, licensed review or local codes.";

    static final List<String> SECTIONS = List.of("Summary", "The model as checked", "Determinacy, stability and equilibrium",
            "Claims compared", "Computed results (no claims were given)", "Queries for the originator", "Diagrams of the load sets",
            "Force-method working", "Plausibility warnings", "Assumptions and cautions", "Sign-off");

    /** Each page's text in reading order. */
    static List<String> pages(Path pdf) throws IOException {
        List<String> out = new ArrayList<>();
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            // spaces are found from the gaps between glyphs, not from space characters in the content
            // stream (the PDF writer sets one at the start of each paragraph line, on top of its first letter)
            PDFTextStripper s = new PDFTextStripper() {
                @Override
                protected void processTextPosition(TextPosition t) {
                    if (!t.getUnicode().isBlank()) super.processTextPosition(t);
                }
            };
            s.setSortByPosition(true);
            for (int p = 1; p <= doc.getNumberOfPages(); p++) {
                s.setStartPage(p);
                s.setEndPage(p);
                out.add(s.getText(doc));
            }
        }
        return out;
    }

    /** The body lines of a page: the footer (its rule, caution, title and page number) taken off. */
    static List<String> body(String page) {
        List<String> lines = new ArrayList<>();
        for (String l : page.split("\\R")) if (!l.isBlank()) lines.add(l.strip());
        int caution = -1;
        for (int i = 0; i < lines.size(); i++) if (lines.get(i).startsWith("Independent check of a simplified linear-elastic")) caution = i;
        return caution < 0 ? lines : lines.subList(0, caution);
    }

    static boolean heading(String line) {
        Matcher m = Pattern.compile("^(\\d{1,2}) +(.*)$").matcher(line);
        return m.matches() && SECTIONS.contains(m.group(2));
    }

    /** A caption: a line the report sets above a table or picture (they end in ':' or name a table). */
    static boolean caption(String line) {
        return line.endsWith(":") || line.matches("^(Nodes|Supports|Members|Sections|Materials|Loads as given|Load sets checked"
                + "|Explanations of the claim set|Equilibrium of the claimed reactions)\\b.*") || line.matches(".*  -  .*combination.*");
    }

    static Path check(Path dir, String... args) throws Exception {
        Path pdf = dir.resolve("r.pdf");
        List<String> all = new ArrayList<>(List.of("check"));
        all.addAll(List.of(args));
        all.addAll(List.of("--pdf", pdf.toString()));
        CliRunner r = CliRunner.run(all.toArray(String[]::new));
        assertTrue(r.code() <= 1 || r.code() == 4, r.err());
        return pdf;
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource({
            "samples/footbridge-truss.yaml, samples/footbridge-truss-claims.yaml",
            "samples/three-span-beam.yaml, samples/three-span-beam-claims.csv",
            "samples/portal-frame.yaml, samples/portal-frame-claims.yaml",
            "samples/office-floor-beam.yaml, samples/office-floor-beam-claims.yaml",
            "samples/gable-frame-us.yaml, samples/gable-frame-us-claims.csv",
            "samples/warehouse-joist.yaml, samples/warehouse-joist-claims.csv",
            "samples/portal-frame.yaml, ",
            "checks/20-two-span-pattern-live.yaml, ",
    })
    void everyPageCarriesTheCautionAndNoPageEndsOnAHeadingOrCaption(String model, String claims) throws Exception {
        Path pdf = claims == null ? check(tempDir, model) : check(tempDir, model, "--claims", claims);
        List<String> pages = pages(pdf);
        String previousSection = "0";
        for (int p = 0; p < pages.size(); p++) {
            String text = pages.get(p).replaceAll("\\s+", " ");
            assertTrue(text.contains(FOOTER_CAUTION), "caution on page " + (p + 1));
            assertTrue(text.contains("page " + (p + 1) + " of " + pages.size()), "page number on page " + (p + 1) + ": " + text);
            List<String> lines = body(pages.get(p));
            String last = lines.get(lines.size() - 1);
            assertFalse(heading(last), "page " + (p + 1) + " ends on the heading '" + last + "'");
            assertFalse(caption(last), "page " + (p + 1) + " ends on the caption '" + last + "'");
            if (text.contains("The model with the loads of load case") || text.contains("The model ")) {
                // the symbols legend is on the page of the sketch it explains
                if (text.contains("The model with the loads of load case")) assertTrue(text.contains("Symbols:"), "legend with the sketch");
            }
            for (String l : lines) {
                if (!heading(l)) continue;
                String n = l.split(" ")[0];
                assertEquals(Integer.parseInt(previousSection) + 1, Integer.parseInt(n), "sections numbered without a gap: " + l);
                previousSection = n;
            }
        }
        assertTrue(Integer.parseInt(previousSection) >= 9, "every section found");
    }

    @Test
    void everyNodeMemberSectionAndLoadValueOfTheModelIsEchoed() throws Exception {
        for (String file : new String[]{"samples/footbridge-truss.yaml", "samples/portal-frame.yaml", "samples/gable-frame-us.yaml",
                "samples/office-floor-beam.yaml", "checks/16-inclined-roller.yaml", "checks/14-fixed-beam-settlement.yaml"}) {
            Path dir = Files.createDirectories(tempDir.resolve(Path.of(file).getFileName().toString()));
            String text = String.join("\n", pages(check(dir, file))).replaceAll("\\s+", " ");
            Model m = ModelReader.read(Path.of(file));
            var u = m.units();
            for (Node n : m.nodes().values()) {
                assertTrue(text.contains(n.name() + " " + Console.fmt(u.fromInternal(n.xM(), Dimension.LENGTH)) + " "
                        + Console.fmt(u.fromInternal(n.yM(), Dimension.LENGTH))), file + ": node " + n.name() + " with its coordinates");
            }
            for (Member mem : m.members().values()) {
                assertTrue(text.contains(mem.name() + " " + mem.from() + " -> " + mem.to() + " "
                        + Console.fmt(u.fromInternal(m.lengthM(mem), Dimension.LENGTH))), file + ": member " + mem.name());
            }
            for (String s : m.sections().keySet()) assertTrue(text.contains(s), file + ": section " + s);
            for (String s : m.supports().keySet()) assertTrue(text.contains(s + " "), file + ": support " + s);
            for (LoadCase c : m.loadCases()) {
                for (MemberLoad l : c.memberLoads()) {
                    String v = l instanceof MemberLoad.Distributed d ? Console.fmt(u.fromInternal(d.w1NPerM(), Dimension.FORCE_PER_LENGTH))
                            : l instanceof MemberLoad.Point pt ? Console.fmt(u.fromInternal(pt.forceN(), Dimension.FORCE))
                            : Console.fmt(u.fromInternal(((MemberLoad.Couple) l).momentNm(), Dimension.MOMENT));
                    assertTrue(text.contains("member " + l.member()) && text.contains(v), file + ": load " + v + " on " + l.member());
                }
                for (NodeLoad nl : c.nodeLoads()) {
                    assertTrue(text.contains("Fx " + Console.fmt(u.fromInternal(nl.fxN(), Dimension.FORCE)) + ", Fy "
                            + Console.fmt(u.fromInternal(nl.fyN(), Dimension.FORCE))), file + ": node load at " + nl.node());
                }
                assertTrue(text.contains(c.name() + " (" + c.type()), file + ": load case " + c.name());
            }
        }
    }

    /** Names in Greek, Cyrillic and Chinese, with an en dash and an inequality sign (an invented scenario). */
    static final String NON_LATIN = """
            format: plumbline/1
            job: {title: "Γέφυρα – 桥 ≤ test of names"}
            units: {force: kN, length: m}
            materials: {steel: {E: 210 GPa}}
            sections: {Σ1: {A: 5000 mm2, I: 8.0e7 mm4, material: steel}}
            nodes: {Α: [0, 0], Узел: [6, 0], 节点: [12, 0]}
            supports: {Α: pinned, Узел: roller, 节点: roller}
            members:
              Δοκός–1: {from: Α, to: Узел, section: Σ1}
              梁2: {from: Узел, to: 节点, section: Σ1}
            loads:
              Gк: {type: dead, member_loads: [{member: Δοκός–1, w: -10}, {member: 梁2, w: -10}]}
            """;

    @Test
    void namesOutsideLatin1ComeOutExactlyAndDistinct() throws Exception {
        Path model = tempDir.resolve("names.yaml");
        Files.writeString(model, NON_LATIN);
        String text = String.join("\n", pages(check(tempDir, model.toString()))).replaceAll("\\s+", " ");
        for (String name : new String[]{"Γέφυρα – 桥 ≤ test of names", "Σ1", "Α 0 0", "Узел 6.000 0", "节点 12.00 0",
                "Δοκός–1 Α -> Узел 6.000", "梁2 Узел -> 节点 6.000", "Gк (dead)"}) {
            assertTrue(text.contains(name), name + " in " + text);
        }
        assertFalse(text.contains("?"), "no character replaced by '?'");
        assertFalse(text.contains("[U+"), "every character had a glyph");
    }

    @Test
    void theForceMethodWorkingIsInTheModelsUnits() throws Exception {
        // propped cantilever in kN and mm, L = 6000 mm, EI = 200 GPa * 1e8 mm4 = 2e10 kN*mm2: delta = L^3 / 3EI
        // = 2.16e11 / 6e10 = 3.6 mm/kN, Delta_0 = -wL^4 / 8EI = -0.01 * 1.296e15 / 1.6e11 = -81 mm, z = 81 / 3.6 = 22.5 kN
        // (statics and beam tables by hand); in mm a slip between force and moment units would show (1 kN*mm is not 1 kN)
        Path model = tempDir.resolve("propped.yaml");
        Files.writeString(model, """
                format: plumbline/1
                units: {force: kN, length: mm}
                materials: {steel: {E: 200 GPa}}
                sections: {G: {A: 1.0e4, I: 1.0e8, material: steel}}
                nodes: {A: [0, 0], B: [6000, 0]}
                supports: {A: fixed, B: roller}
                members: {M1: {from: A, to: B, section: G}}
                loads: {W: {type: dead, member_loads: [{member: M1, w: -0.01}]}}
                """);
        String text = String.join("\n", pages(check(tempDir, model.toString()))).replaceAll("\\s+", " ");
        assertTrue(text.contains("in mm/kN (force-force)") && text.contains("every entry x 10^0: delta_ij B.Fy B.Fy 3.600"), text);
        assertTrue(text.contains("W -81.00 22.50"), text);
    }

    @Test
    void aCharacterNoEmbeddedFontHoldsPrintsAsItsCodePoint() throws Exception {
        Path model = tempDir.resolve("emoji.yaml");
        Files.writeString(model, NON_LATIN.replace("Σ1", "S\uD83D\uDE001"));
        String text = String.join("\n", pages(check(tempDir, model.toString()))).replaceAll("\\s+", " ");
        assertTrue(text.contains("S[U+1F600]1"), "a character neither font holds prints as its code point: " + text);
    }

    @Test
    void loadSetsWhoseNamesDifferOnlyOutsideAsciiGetFiguresOfTheirOwn() throws Exception {
        Path model = tempDir.resolve("names.yaml");
        Files.writeString(model, NON_LATIN + "  Gж: {type: live, member_loads: [{member: 梁2, w: -5}]}\n"
                + "claims:\n  reactions:\n    - {node: Α, combo: Gк, Fy: 99}\n    - {node: Α, combo: Gж, Fy: 99}\n");
        Path figures = Files.createDirectories(tempDir.resolve("figures"));
        CliRunner r = CliRunner.run("check", model.toString(), "--figures", figures.toString());
        assertEquals(1, r.code(), r.err());
        assertTrue(Files.exists(figures.resolve("G_-moment.png")) && Files.exists(figures.resolve("G_-2-moment.png")),
                "both flagged load sets drawn, neither file overwritten");
    }

    @Test
    void aLongTitleIsShortenedInTheFooterAndTheResultsCarryTheCaution() throws Exception {
        Path model = tempDir.resolve("long.yaml");
        String title = "Roof of the north annex ".repeat(12).strip();
        Files.writeString(model, NON_LATIN.replace("Γέφυρα – 桥 ≤ test of names", title));
        Path json = tempDir.resolve("r.json");
        List<String> pages = pages(check(tempDir, model.toString(), "--json", json.toString()));
        for (int p = 0; p < pages.size(); p++) {
            List<String> lines = new ArrayList<>(List.of(pages.get(p).strip().split("\\R")));
            String footer = lines.get(lines.size() - 1);
            assertTrue(footer.matches("Plumbline \\S+ discrepancy report - Roof of the north annex.*\\.\\.\\. ?page " + (p + 1) + " of "
                    + pages.size()), "the footer's title is cut short before the page number: " + footer);
        }
        assertTrue(Files.readString(json).contains("\"caution\" : \"This is an independent check of a simplified"), "caution in the JSON");
    }

    @Test
    void theConsoleGivesTheMomentSumOfClaimedReactionsInMomentUnits() {
        // portal-frame claims: the reactions of ULS-W are out of balance (a sign slip at E), sums printed with their own units
        CliRunner r = CliRunner.run("check", "samples/portal-frame.yaml", "--claims", "samples/portal-frame-claims.yaml");
        String out = r.out().replaceAll("\\s+", " ");
        assertTrue(Pattern.compile("sum Fx -?[0-9.]+ kN; sum Fy -?[0-9.]+ kN; sum M about A -?[0-9.]+ kN\\*m").matcher(out).find(), out);
    }

    @Test
    void noNumberPrintsInENotationOrAsMinusZeroAndAClaimedZeroIsNotAHundredPercent() throws Exception {
        // the truss's claimed Fx = 0 at L0 is computed as rounding (about 1e-15 kN): judged by the floor, shown as 0
        String text = String.join("\n", pages(check(tempDir, "samples/footbridge-truss.yaml", "--claims",
                "samples/footbridge-truss-claims.yaml"))).replaceAll("\\s+", " ");
        String numbers = numbers(text);
        Matcher e = Pattern.compile("\\d\\.?\\d*e[-+]?\\d").matcher(numbers);
        assertFalse(e.find(), () -> "e-notation: " + numbers.substring(Math.max(0, e.start() - 60), e.end() + 20));
        assertFalse(Pattern.compile("(?<![\\w.])-0(\\.0+)?(?![\\d.])").matcher(text).find(), "no -0");
        assertTrue(text.contains("reaction L0 Fx 0 kN 0 kN 0 kN 0 kN ±"), "a claimed zero against rounding: " + text);
        // a tolerance of 0.0001% (the check case's own): the floor governs and the rounding difference prints as 0
        Path other = Files.createDirectories(tempDir.resolve("fine"));
        String fine = String.join("\n", pages(check(other, "checks/20-two-span-pattern-live.yaml"))).replaceAll("\\s+", " ");
        assertFalse(Pattern.compile("\\d\\.?\\d*e[-+]?\\d").matcher(numbers(fine)).find(), fine);
        assertTrue(fine.contains("reaction A Fy 26.25 kN 26.25 kN 26.25 kN 0 kN"), fine);
        assertFalse(text.contains("100.0%"), "no 100% for a claimed zero");
    }

    /**
     * The report's text without what may rightly carry an exponent or look like one: the
     * SHA-256 hashes and the run's own residual and agreement figures (1e-15 and the like).
     */
    static String numbers(String text) {
        return text.replaceAll("\\b[0-9a-f]{64}\\b", "").replaceAll("residual at most [0-9.e+-]+ of the load \\(limit [0-9.e+-]+\\)", "")
                .replaceAll("agree to [0-9.e+-]+ \\(limit [0-9.e+-]+\\)", "");
    }

    @Test
    void deflectionsAreInMillimetresWithTheirSpanRatio() throws Exception {
        // the joist's SLS deflection claim, written as L/506 on a 5 m span: 5000 / 506 = 9.881 mm (by hand)
        String text = String.join("\n", pages(check(tempDir, "samples/warehouse-joist.yaml", "--claims",
                "samples/warehouse-joist-claims.csv"))).replaceAll("\\s+", " ");
        assertTrue(Pattern.compile("member S1 deflection 9\\.881 mm \\S* ?\\(L/506\\)").matcher(text).find()
                || text.contains("9.881 mm") && text.contains("(L/506)"), text);
        assertTrue(Pattern.compile("envelope drawn x \\d+; largest \\d+\\.\\d+ mm at member S\\d at \\S+ m").matcher(text).find(),
                "the envelope of the deflection states its scale and largest value: " + text);
        String portal = String.join("\n", pages(check(Files.createDirectories(tempDir.resolve("p")), "samples/portal-frame.yaml")))
                .replaceAll("\\s+", " ");
        assertTrue(portal.contains("displacements drawn x"), "the deflected shape states its scale");
        assertTrue(text.contains("Force-method working") || text.contains("force method was not run"));
    }

    @Test
    void anUnstableModelNumbersItsSectionsWithoutAGapAndPromisesNoResults() throws Exception {
        Path model = tempDir.resolve("mechanism.yaml");
        // two rollers: the beam can slide sideways, a mechanism (statics by hand)
        Files.writeString(model, """
                format: plumbline/1
                units: {force: kN, length: m}
                materials: {steel: {E: 210 GPa}}
                sections: {G: {A: 5000 mm2, I: 8.0e7 mm4, material: steel}}
                nodes: {A: [0, 0], B: [6, 0]}
                supports: {A: roller, B: roller}
                members: {M1: {from: A, to: B, section: G}}
                loads: {D: {type: dead, member_loads: [{member: M1, w: -10}]}}
                """);
        List<String> pages = pages(check(tempDir, model.toString()));
        String text = String.join("\n", pages).replaceAll("\\s+", " ");
        assertFalse(text.contains("see the JSON"), "promises nothing it does not give");
        assertTrue(text.contains("6 Force-method working"), "diagrams are left out and the numbers close up: " + text);
        assertTrue(text.contains("9 Sign-off"));
        assertTrue(text.contains("Mechanism 1"));
    }

    @Test
    void figureFilesCarryATitleLineAndTheCaution() throws Exception {
        CliRunner r = CliRunner.run("check", "samples/portal-frame.yaml", "--claims", "samples/portal-frame-claims.yaml",
                "--figures", tempDir.toString());
        assertEquals(1, r.code(), r.err());
        for (String f : new String[]{"model.png", "ULS-W-moment.png", "ULS-W-deflection.png"}) {
            BufferedImage img = ImageIO.read(tempDir.resolve(f).toFile());
            int top = ink(img, 0, 14 * 2), bottom = ink(img, img.getHeight() - 12 * 2, img.getHeight());
            assertTrue(top > 200, f + ": a title line above the drawing (" + top + " dark pixels)");
            assertTrue(bottom > 200, f + ": the caution below the drawing (" + bottom + " dark pixels)");
        }
    }

    private static int ink(BufferedImage img, int y0, int y1) {
        int n = 0;
        for (int y = y0; y < y1; y++) for (int x = 0; x < img.getWidth(); x++) if ((img.getRGB(x, y) & 0xff) < 128) n++;
        return n;
    }
}
