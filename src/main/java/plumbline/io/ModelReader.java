package plumbline.io;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.Charset;
import java.nio.charset.CoderResult;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import plumbline.model.ClaimSet;
import plumbline.model.Combination;
import plumbline.model.InputException;
import plumbline.model.Job;
import plumbline.model.LoadCase;
import plumbline.model.Material;
import plumbline.model.Member;
import plumbline.model.Model;
import plumbline.model.Node;
import plumbline.model.Problem;
import plumbline.model.Section;
import plumbline.model.SourceRef;
import plumbline.model.Support;
import plumbline.units.Dimension;
import plumbline.units.Unit;
import plumbline.units.UnitParseException;
import plumbline.units.UnitSystem;
import plumbline.units.Units;

/**
 * Reads a model file (format reference (src/site/markdown/formats.md) sections 1 to 4) into a {@link Model} in SI units. Every
 * problem is collected with its file, line and column before one {@link InputException}
 * is thrown; nothing is half-read.
 */
public final class ModelReader {

    public static final String FORMAT_MAJOR = "plumbline/1";

    private static final List<String> TOP_KEYS = List.of("format", "job", "units", "materials", "sections",
            "nodes", "supports", "members", "loads", "combinations", "standard_combinations", "claims",
            "force_method");

    private final String file;
    private final List<Problem> problems = new ArrayList<>();

    private ModelReader(String file) {
        this.file = file;
    }

    /** Reads {@code path} (.yaml, .yml or .json). */
    public static Model read(Path path) throws InputException {
        String name = path.toString();
        String text = readText(path);
        return read(name, text, isYaml(name));
    }

    static boolean isYaml(String name) throws InputException {
        String lower = name.toLowerCase(Locale.ROOT);
        if (lower.endsWith(".yaml") || lower.endsWith(".yml")) return true;
        if (lower.endsWith(".json")) return false;
        throw new InputException(new Problem(SourceRef.none(name), "(file)",
                "unknown file type; expected a name ending in .yaml, .yml or .json"));
    }

    static String readText(Path path) throws InputException {
        return decode(path.toString(), readBytes(path));
    }

    /** A model given as a file's name and bytes (as the workbench holds it); the name tells YAML from JSON. */
    public static Model read(String name, byte[] bytes) throws InputException {
        boolean yaml = isYaml(name);
        return read(name, decode(name, bytes), yaml);
    }

    /** The bytes of an input file, refused with a message when it is missing or larger than is read. */
    public static byte[] readBytes(Path path) throws InputException {
        String name = path.toString();
        try {
            if (!Files.isRegularFile(path)) {
                throw new InputException(new Problem(SourceRef.none(name), "(file)", "no such file"));
            }
            if (Files.size(path) > TreeReader.MAX_CHARS) {
                throw new InputException(new Problem(SourceRef.none(name), "(file)",
                        "file is " + Files.size(path) + " bytes; at most " + TreeReader.MAX_CHARS + " are read"));
            }
            return Files.readAllBytes(path);
        } catch (IOException e) {
            throw new InputException(new Problem(SourceRef.none(name), "(file)", "cannot read: " + e.getMessage()));
        }
    }

    /**
     * The text of a file's bytes: UTF-8 (with or without a byte-order mark), or UTF-16 as some
     * spreadsheet and editor exports save it (told by its byte-order mark, or by the zero
     * bytes of ASCII text in UTF-16 without one). Bytes that are not valid UTF-8 are refused
     * with the line they are on, rather than read as replacement characters: a name that
     * silently changed would no longer match the calc package.
     */
    public static String decode(String name, byte[] bytes) throws InputException {
        Charset cs = StandardCharsets.UTF_8;
        int skip = 0;
        if (bytes.length >= 2 && (bytes[0] & 0xFF) == 0xFE && (bytes[1] & 0xFF) == 0xFF) {
            cs = StandardCharsets.UTF_16BE;
            skip = 2;
        } else if (bytes.length >= 2 && (bytes[0] & 0xFF) == 0xFF && (bytes[1] & 0xFF) == 0xFE) {
            cs = StandardCharsets.UTF_16LE;
            skip = 2;
        } else if (bytes.length >= 4 && bytes.length % 2 == 0 && bytes[0] != 0 && bytes[1] == 0 && bytes[2] != 0 && bytes[3] == 0) {
            cs = StandardCharsets.UTF_16LE;
        } else if (bytes.length >= 4 && bytes.length % 2 == 0 && bytes[0] == 0 && bytes[1] != 0 && bytes[2] == 0 && bytes[3] != 0) {
            cs = StandardCharsets.UTF_16BE;
        }
        String text;
        try {
            text = cs.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT)
                    .decode(ByteBuffer.wrap(bytes, skip, bytes.length - skip)).toString();
        } catch (CharacterCodingException e) {
            if (cs != StandardCharsets.UTF_8 || hasZero(bytes)) {
                throw new InputException(new Problem(SourceRef.none(name), "(file)",
                        "the file holds binary data; expected a YAML, JSON or CSV text file"));
            }
            int bad = firstBadUtf8(bytes), line = 1, column = 1;
            for (int i = 0; i < bad; i++) {
                if (bytes[i] == '\n') {
                    line++;
                    column = 1;
                } else if ((bytes[i] & 0xC0) != 0x80) {
                    column++;
                }
            }
            throw new InputException(new Problem(new SourceRef(name, line, column), "(file)", String.format(Locale.ROOT,
                    "byte 0x%02X is not UTF-8 text (the file may be saved as Latin-1 or Windows-1252); expected the file "
                            + "saved as UTF-8", bytes[bad] & 0xFF)));
        }
        if (text.indexOf('\0') >= 0) {
            throw new InputException(new Problem(SourceRef.none(name), "(file)",
                    "the file holds binary data; expected a YAML, JSON or CSV text file"));
        }
        if (!text.isEmpty() && text.charAt(0) == '\uFEFF') text = text.substring(1);
        return text;
    }

    private static boolean hasZero(byte[] bytes) {
        for (byte b : bytes) if (b == 0) return true;
        return false;
    }

    /** The index of the first byte that is not valid UTF-8, where the JDK's decoder stops. */
    private static int firstBadUtf8(byte[] b) {
        ByteBuffer in = ByteBuffer.wrap(b);
        CoderResult r = StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT).decode(in, CharBuffer.allocate(b.length), true);
        return r.isError() ? in.position() : Math.max(0, b.length - 1);
    }

    public static Model read(String file, String text, boolean yaml) throws InputException {
        return fromTree(file, TreeReader.read(file, text, yaml));
    }

    /** The model a document read as a located tree describes. */
    static Model fromTree(String file, Tree root) throws InputException {
        ModelReader r = new ModelReader(file);
        Model m = r.model(root);
        if (!r.problems.isEmpty() || m == null) throw new InputException(r.problems);
        return m;
    }

    private Model model(Tree root) {
        if (root instanceof Tree.MapNode mn && mn.entries().containsKey("claims") && !mn.entries().containsKey("format")) {
            problems.add(new Problem(mn.at(), "(document)", "this is a claims file, not a model; expected a model "
                    + "with 'format: plumbline/1' (give claims files with --claims)"));
            return null;
        }
        Fields top = Fields.of(root, "", problems, TOP_KEYS, "a map with 'format: plumbline/1'");
        if (top == null) return null;
        String format = top.text("format", true, "'" + FORMAT_MAJOR + "'");
        if (format != null && !format.equals(FORMAT_MAJOR)) {
            String why = format.startsWith("plumbline/") ? "unknown major version '" + format + "'"
                    : "'" + format + "' is not a Plumbline model format";
            top.problem(top.at("format"), "format", why + "; this tool reads '" + FORMAT_MAJOR + "'");
        }
        UnitSystem units = unitSystem(top.get("units"), "units", true);
        if (units == null) return null;
        Job job = job(top.get("job"));
        PropertiesReader properties = new PropertiesReader(problems);
        Map<String, Material> materials = properties.materials(top.get("materials"), units);
        Map<String, Section> sections = properties.sections(top.get("sections"), units, materials);
        GeometryReader geometry = new GeometryReader(problems);
        Map<String, Node> nodes = geometry.nodes(top.get("nodes"), top.map.at(), units);
        Map<String, Support> supports = geometry.supports(top.get("supports"), units, nodes);
        Map<String, Member> members = geometry.members(top.get("members"), top.map.at(), nodes, sections);
        List<LoadCase> cases = new LoadsReader(problems).loadCases(top.get("loads"), units, nodes, members, supports);
        CombinationsReader combinations = new CombinationsReader(problems);
        List<Combination> combos = combinations.combinations(top.get("combinations"), cases);
        List<String> standards = combinations.standardSets(top);
        List<String> redundants = redundants(top.get("force_method"));
        Model partial = new Model(file, job, units, materials, sections, nodes, supports, members, cases, combos,
                standards, redundants, List.of());
        List<ClaimSet> claims = new ArrayList<>();
        if (top.has("claims")) {
            ClaimSet cs = ClaimsReader.claimSet(top.get("claims"), file, "claims", problems, partial);
            if (cs != null) claims.add(cs);
        }
        return partial.withClaims(claims);
    }

    static UnitSystem unitSystem(Tree t, String path, List<Problem> problems, boolean required, SourceRef where) {
        if (t == null) {
            if (required) problems.add(new Problem(where, path, "missing; expected e.g. {force: kN, length: m}"));
            return null;
        }
        Fields f = Fields.of(t, path, problems, List.of("force", "length"), "a map such as {force: kN, length: m}");
        if (f == null) return null;
        Unit force = unit(f, "force", Dimension.FORCE, problems);
        Unit length = unit(f, "length", Dimension.LENGTH, problems);
        return force == null || length == null ? null : new UnitSystem(force, length);
    }

    private UnitSystem unitSystem(Tree t, String path, boolean required) {
        return unitSystem(t, path, problems, required, new SourceRef(file, 1, 1));
    }

    private static Unit unit(Fields f, String key, Dimension d, List<Problem> problems) {
        String s = f.text(key, true, "a " + d.describe() + " unit such as " + (d == Dimension.FORCE ? "kN" : "m"));
        if (s == null) return null;
        try {
            Unit u = Units.parse(s);
            if (!u.dimension().equals(d)) {
                f.problem(f.at(key), key, "unit '" + s + "' is " + u.dimension().describe() + "; expected a " + d.describe() + " unit");
                return null;
            }
            return new Unit(s, u.dimension(), u.toInternal());
        } catch (UnitParseException e) {
            f.problem(f.at(key), key, e.getMessage());
            return null;
        }
    }

    private Job job(Tree t) {
        if (t == null) return Job.EMPTY;
        Fields f = Fields.of(t, "job", problems,
                List.of("title", "project", "calc_ref", "originator", "checker", "scope", "category"), "a map of text fields");
        if (f == null) return Job.EMPTY;
        return new Job(str(f, "title"), str(f, "project"), str(f, "calc_ref"), str(f, "originator"),
                str(f, "checker"), str(f, "scope"), str(f, "category"));
    }

    private static String str(Fields f, String key) {
        String s = f.text(key, false, "text");
        return s == null ? "" : s;
    }

    private List<String> redundants(Tree t) {
        if (t == null) return List.of();
        Fields f = Fields.of(t, "force_method", problems, List.of("redundants"), "a map such as {redundants: [B.Fy]}");
        if (f == null) return List.of();
        List<String> out = new ArrayList<>();
        for (Tree r : f.list("redundants", false, "a list such as [B.Fy, M2.M_end]")) {
            if (r instanceof Tree.Scalar s && s.kind() != Tree.Scalar.Kind.NULL) out.add(s.text());
            else problems.add(new Problem(r.at(), "force_method.redundants", "found " + r.describe() + "; expected a name such as B.Fy"));
        }
        return out;
    }
}
