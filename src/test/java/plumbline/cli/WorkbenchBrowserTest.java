package plumbline.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.openqa.selenium.By;
import org.openqa.selenium.JavascriptExecutor;
import org.openqa.selenium.Keys;
import org.openqa.selenium.OutputType;
import org.openqa.selenium.Rectangle;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.chrome.ChromeDriver;
import org.openqa.selenium.chrome.ChromeDriverService;
import org.openqa.selenium.chrome.ChromeOptions;
import org.openqa.selenium.support.ui.WebDriverWait;
import plumbline.serve.Workbench;

/**
 * The workbench in a real browser: Debian's chromium, headless, driven through
 * chromedriver. A checker types a model with a slip, sees the message at its line, mends it
 * in the members table, pastes claims from a spreadsheet, checks, reads the discrepancy on
 * the drawing and downloads the report, which reads as the check command's for the same
 * files. The values checked come from the command line's own check of the same portal frame
 * (whose statics are tested by hand elsewhere); the screenshot is inspected for the flag.
 */
class WorkbenchBrowserTest {

    static final String CHROMIUM = "/usr/bin/chromium", DRIVER = "/usr/bin/chromedriver";

    @TempDir
    Path folder;
    @TempDir
    Path downloads;
    @TempDir
    Path profile;

    Workbench wb;
    ChromeDriver browser;
    WebDriverWait wait;

    @BeforeEach
    void open() throws Exception {
        assertTrue(Files.isExecutable(Path.of(CHROMIUM)) && Files.isExecutable(Path.of(DRIVER)),
                "the browser tests need Debian's chromium and chromium-driver: run  bash .ci/setup --browser");
        wb = Workbench.start(folder, 0);
        ChromeOptions o = new ChromeOptions();
        o.setBinary(CHROMIUM);
        o.addArguments("--headless=new", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run",
                "--disable-background-networking", "--disable-component-update", "--disable-sync", "--disable-dev-shm-usage",
                "--window-size=1400,1250", "--user-data-dir=" + profile);
        Map<String, Object> prefs = new HashMap<>();
        prefs.put("download.default_directory", downloads.toString());
        prefs.put("download.prompt_for_download", false);
        o.setExperimentalOption("prefs", prefs);
        ChromeDriverService service = new ChromeDriverService.Builder().usingDriverExecutable(Path.of(DRIVER).toFile())
                .usingAnyFreePort().build();
        browser = new ChromeDriver(service, o);
        wait = new WebDriverWait(browser, Duration.ofSeconds(30));
    }

    @AfterEach
    void close() {
        if (browser != null) browser.quit();
        if (wb != null) wb.close();
    }

    Object js(String script, Object... args) {
        return ((JavascriptExecutor) browser).executeScript(script, args);
    }

    /** The messages under the editor (their text also while another tab is shown). */
    String messages() {
        return (String) js("return document.getElementById('messages').textContent");
    }

    @Test
    void typeMendPasteCheckAndDownload() throws Exception {
        browser.get(wb.address().toString());
        wait.until(d -> messages().contains("reads without problems")); // the starter model

        // type a model, with a slip: rafter R1 ends at a node that does not exist
        String model = Files.readString(Path.of("samples/portal-frame.yaml")).replace("R1: {from: B, to: C,", "R1: {from: B, to: X,");
        int slipLine = List.of(model.split("\n")).indexOf("  R1: {from: B, to: X, section: RAF}") + 1;
        WebElement text = browser.findElement(By.id("model-text"));
        text.sendKeys(Keys.chord(Keys.CONTROL, "a"), Keys.DELETE);
        text.sendKeys(model);
        wait.until(d -> messages().contains("line " + slipLine + ":"));
        assertTrue(messages().contains("'X'"), messages());
        assertEquals("bad", browser.findElement(By.cssSelector("#gutter div:nth-child(" + slipLine + ")")).getAttribute("class"));

        // mend it in the members table: the text changes in place, its comments kept
        browser.findElement(By.cssSelector("nav[data-group=model] button[data-tab=tables]")).click();
        WebElement to = browser.findElement(By.cssSelector("table[data-section=members] tr[data-name=R1] td:nth-child(3) input"));
        to.sendKeys(Keys.chord(Keys.CONTROL, "a"), "C", Keys.TAB);
        wait.until(d -> messages().contains("reads without problems"));
        String edited = (String) js("return document.getElementById('model-text').value");
        assertEquals(Files.readString(Path.of("samples/portal-frame.yaml")), edited, "only the value changed; comments and layout kept");
        assertEquals(3, browser.findElements(By.cssSelector("#drawing line.member")).size());
        assertEquals(2, browser.findElements(By.cssSelector("#drawing g.support")).size());

        // add a load through the loads table, then take it out again: the text follows both ways
        new org.openqa.selenium.support.ui.Select(browser.findElement(By.cssSelector("table[data-section=loads] select[aria-label='new load case']")))
                .selectByValue("W");
        new org.openqa.selenium.support.ui.Select(browser.findElement(By.cssSelector("table[data-section=loads] select[aria-label='new load list']")))
                .selectByValue("node_loads");
        browser.findElement(By.cssSelector("input[aria-label='new load node']")).sendKeys("B");
        browser.findElement(By.cssSelector("input[aria-label='new load Fx']")).sendKeys("5");
        browser.findElement(By.xpath("//button[text()='Add load']")).click();
        wait.until(d -> ((String) js("return document.getElementById('model-text').value"))
                .contains("    node_loads:\n      - {node: B, Fx: 5}\n"));
        wait.until(d -> d.findElements(By.cssSelector("table[data-section=loads] tr[data-case=W]")).size() == 2);
        List<WebElement> wRows = browser.findElements(By.cssSelector("table[data-section=loads] tr[data-case=W]"));
        wRows.get(1).findElement(By.tagName("button")).click();
        wait.until(d -> edited.equals(js("return document.getElementById('model-text').value")));

        // save it into the folder
        WebElement name = browser.findElement(By.id("model-name"));
        name.clear();
        name.sendKeys("typed-portal.yaml");
        browser.findElement(By.id("save-model")).click();
        wait.until(d -> Files.exists(folder.resolve("typed-portal.yaml")));
        assertEquals(edited, Files.readString(folder.resolve("typed-portal.yaml")));

        // paste claims as a spreadsheet copies them: tab-separated, a header row, decimal commas;
        // the horizontal reaction at E is given with the wrong sign
        String block = "item\tcombo\tname\tquantity\tvalue\tunit\n"
                + "reaction\tULS-W\tA\tFx\t-10,2\tkN\n"
                + "reaction\tULS-W\tE\tFx\t10,0\tkN\n"
                + "reaction\tULS-W\tE\tFy\t17,3\tkN\n"
                + "member\tULS-W\tR1\tM_min\t-23,8\tkN*m\n";
        js("const dt = new DataTransfer(); dt.setData('text/plain', arguments[0]);"
                + "document.querySelector('#claims input').dispatchEvent(new ClipboardEvent('paste', {clipboardData: dt, bubbles: true, cancelable: true}));", block);
        assertEquals(4, browser.findElements(By.cssSelector("#claims tr[data-row]:not([data-row=new])")).size());
        assertEquals("-10.2", browser.findElement(By.cssSelector("#claims tr[data-row='0'] input[data-col=value]")).getAttribute("value"));

        // check: the discrepancies as a table and on the drawing
        name.clear();
        name.sendKeys("portal-frame.yaml");
        WebElement claimsName = browser.findElement(By.id("claims-name"));
        claimsName.clear();
        claimsName.sendKeys("portal-frame-claims.csv");
        browser.findElement(By.id("check")).click();
        wait.until(d -> !d.findElements(By.cssSelector("#discrepancies tr[data-id]")).isEmpty());
        WebElement first = browser.findElement(By.cssSelector("#discrepancies tr[data-id]"));
        assertEquals("R-E-ULS-W-Fx", first.getAttribute("data-id"), "the mismatch is listed first");
        assertTrue(first.getText().startsWith("mismatch"), first.getText());
        assertTrue(first.getText().contains("opposite sign"), first.getText());
        assertTrue(browser.findElement(By.id("status")).getText().contains("MISMATCH"));
        // on the drawing: the support and node at E are flagged, A is not
        assertEquals(1, browser.findElements(By.cssSelector("#drawing g.support.flagged")).size());
        assertEquals("node flagged", browser.findElement(By.cssSelector("#drawing circle[data-node=E]")).getAttribute("class"));
        assertEquals("node", browser.findElement(By.cssSelector("#drawing circle[data-node=A]")).getAttribute("class"));

        byte[] shot = browser.getScreenshotAs(OutputType.BYTES);
        Path shots = Files.createDirectories(Path.of("target/workbench-screenshots"));
        Files.write(shots.resolve("checked.png"), shot);
        BufferedImage img = ImageIO.read(new ByteArrayInputStream(shot));
        Rectangle drawing = browser.findElement(By.id("drawing")).getRect();
        assertTrue(count(img, drawing, 179, 64, 27) > 40, "the flag colour marks the drawing (screenshot target/workbench-screenshots/checked.png)");
        assertTrue(count(img, drawing, 31, 42, 54) > 400, "the structure is drawn in ink");

        // checked again under names the command line can be given too, for the downloads
        Path modelFile = folder.resolve("portal-frame.yaml"), claimsFile = folder.resolve("claims.csv");
        name.clear();
        name.sendKeys(modelFile.toString());
        browser.findElement(By.cssSelector("nav[data-group=lower] button[data-tab=claims]")).click();
        claimsName.clear();
        claimsName.sendKeys(claimsFile.toString());
        String before = browser.findElement(By.id("download-pdf")).getAttribute("href");
        browser.findElement(By.id("check")).click();
        wait.until(d -> !before.equals(d.findElement(By.id("download-pdf")).getAttribute("href")));

        // the diagrams of a load set load as pictures
        browser.findElement(By.cssSelector("nav[data-group=lower] button[data-tab=diagrams]")).click();
        wait.until(d -> !d.findElements(By.cssSelector("#diagrams img")).isEmpty()
                && (Boolean) js("return [...document.querySelectorAll('#diagrams img')].every(i => i.complete && i.naturalWidth > 400)"));
        Files.write(shots.resolve("diagrams.png"), browser.getScreenshotAs(OutputType.BYTES));
        browser.findElement(By.cssSelector("nav[data-group=lower] button[data-tab=explanations]")).click();
        Files.write(shots.resolve("explanations.png"), browser.getScreenshotAs(OutputType.BYTES));

        // the downloads are what check writes for the same files
        browser.findElement(By.cssSelector("nav[data-group=lower] button[data-tab=results]")).click();
        browser.findElement(By.id("download-pdf")).click();
        browser.findElement(By.id("download-json")).click();
        wait.until(d -> done(downloads, ".pdf") && done(downloads, ".json"));
        Files.writeString(modelFile, edited);
        Files.writeString(claimsFile, (String) js("return claimsCsv()"));
        Path out = Files.createDirectories(folder.resolve("cli"));
        CliRunner cli = CliRunner.run("check", modelFile.toString(), "--claims", claimsFile.toString(),
                "--json", out.resolve("r.json").toString(), "--pdf", out.resolve("r.pdf").toString());
        assertEquals(1, cli.code(), cli.err());
        assertArrayEquals(Files.readAllBytes(out.resolve("r.json")), Files.readAllBytes(downloads.resolve("portal-frame-results.json")));
        assertEquals(ReportPagesTest.pages(out.resolve("r.pdf")), ReportPagesTest.pages(downloads.resolve("portal-frame-report.pdf")));

        // a claim naming a node the model lacks: the check refuses the input, and nothing of the earlier check stays
        js("const dt = new DataTransfer(); dt.setData('text/plain', arguments[0]);"
                + "document.querySelector('#claims input').dispatchEvent(new ClipboardEvent('paste', {clipboardData: dt, bubbles: true, cancelable: true}));",
                "reaction\tULS-W\tQ\tFy\t3\tkN\n");
        browser.findElement(By.id("check")).click();
        wait.until(d -> d.findElement(By.id("results")).getText().contains("Input problems"));
        assertTrue(browser.findElement(By.id("results")).getText().contains("claims.csv:6:"), browser.findElement(By.id("results")).getText());
        assertEquals(0, browser.findElements(By.cssSelector("#drawing .flagged")).size(), "no flag of the earlier check");
        assertEquals(0, browser.findElements(By.cssSelector("#diagrams img, #discrepancies, #download-pdf")).size());
    }

    @Test
    void aJsonModelsValuesAreEditedAsJson() {
        browser.get(wb.address().toString());
        wait.until(d -> messages().contains("reads without problems"));
        String model = "{\n  \"format\": \"plumbline/1\",\n  \"units\": {\"force\": \"kN\", \"length\": \"m\"},\n"
                + "  \"materials\": {\"steel\": {\"E\": \"210 GPa\"}},\n"
                + "  \"sections\": {\"B1\": {\"A\": \"5380 mm2\", \"I\": \"8.36e7 mm4\", \"material\": \"steel\"}},\n"
                + "  \"nodes\": {\"A\": [0, 0], \"B\": [6, 0]},\n  \"supports\": {\"A\": \"pinned\", \"B\": \"roller\"},\n"
                + "  \"members\": {\"M1\": {\"from\": \"A\", \"to\": \"B\", \"section\": \"B1\"}}\n}\n";
        WebElement name = browser.findElement(By.id("model-name"));
        name.clear();
        name.sendKeys("beam.json");
        js("const t = document.getElementById('model-text'); t.value = arguments[0]; t.dispatchEvent(new Event('input'));", model);
        wait.until(d -> messages().contains("reads without problems"));
        browser.findElement(By.cssSelector("nav[data-group=model] button[data-tab=tables]")).click();
        // a number stays a number; a name with a space becomes a JSON string, as key and as value
        WebElement x = browser.findElement(By.cssSelector("table[data-section=nodes] tr[data-name=B] td:nth-child(2) input"));
        x.sendKeys(Keys.chord(Keys.CONTROL, "a"), "8", Keys.TAB);
        wait.until(d -> text().contains("\"B\": [8, 0]"));
        wait.until(d -> messages().contains("reads without problems")); // the tables drawn again from the edited text
        WebElement key = browser.findElement(By.cssSelector("table[data-section=sections] tr[data-name=B1] td:nth-child(1) input"));
        key.sendKeys(Keys.chord(Keys.CONTROL, "a"), "Beam 1", Keys.TAB);
        wait.until(d -> text().contains("\"Beam 1\": {"));
        wait.until(d -> !messages().contains("Reading the model")); // read (with a problem until M1 names the section)
        WebElement section = browser.findElement(By.cssSelector("table[data-section=members] tr[data-name=M1] td:nth-child(4) input"));
        section.sendKeys(Keys.chord(Keys.CONTROL, "a"), "Beam 1", Keys.TAB);
        wait.until(d -> text().contains("\"section\": \"Beam 1\"}"));
        wait.until(d -> messages().contains("reads without problems"));
        assertEquals(Boolean.TRUE, js("try { JSON.parse(document.getElementById('model-text').value); return true; } catch (e) { return false; }"));
        // rows are not added or removed in JSON text by the tables: said, and the text left alone
        String before = text();
        browser.findElement(By.cssSelector("table[data-section=supports] tr[data-name=B] button")).click();
        assertTrue(browser.findElement(By.id("status")).getText().contains("JSON"), browser.findElement(By.id("status")).getText());
        assertEquals(before, text());

        // the text moves under the tables before it is read again (a line added above): a cell edit then
        // changes nothing, rather than writing its value where the table last saw it
        js("const t = document.getElementById('model-text'); t.value = '\\n' + t.value;");
        String moved = text();
        WebElement y = browser.findElement(By.cssSelector("table[data-section=nodes] tr[data-name=A] td:nth-child(3) input"));
        y.sendKeys(Keys.chord(Keys.CONTROL, "a"), "2", Keys.TAB);
        assertTrue(browser.findElement(By.id("status")).getText().contains("The text changed under this table"),
                browser.findElement(By.id("status")).getText());
        assertEquals(moved, text());
    }

    String text() {
        return (String) js("return document.getElementById('model-text').value");
    }

    static boolean done(Path dir, String ending) {
        try (Stream<Path> s = Files.list(dir)) {
            List<String> names = s.map(p -> p.getFileName().toString()).toList();
            return names.stream().anyMatch(n -> n.endsWith(ending)) && names.stream().noneMatch(n -> n.endsWith(".crdownload"));
        } catch (java.io.IOException e) {
            return false;
        }
    }

    /** Pixels within the rectangle close to the colour (r, g, b). */
    static int count(BufferedImage img, Rectangle r, int red, int green, int blue) {
        int n = 0;
        for (int y = Math.max(0, r.y); y < Math.min(img.getHeight(), r.y + r.height); y++) {
            for (int x = Math.max(0, r.x); x < Math.min(img.getWidth(), r.x + r.width); x++) {
                int p = img.getRGB(x, y);
                if (Math.abs(((p >> 16) & 255) - red) + Math.abs(((p >> 8) & 255) - green) + Math.abs((p & 255) - blue) < 40) n++;
            }
        }
        return n;
    }
}
