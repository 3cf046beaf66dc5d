package plumbline.io;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import plumbline.model.Material;
import plumbline.model.Problem;
import plumbline.model.Section;
import plumbline.units.Dimension;
import plumbline.units.UnitSystem;

/**
 * Reads the {@code materials} and {@code sections} of a model file (format reference section 2)
 * into SI values, recording a problem for each bad entry.
 */
final class PropertiesReader {

    private final List<Problem> problems;

    PropertiesReader(List<Problem> problems) {
        this.problems = problems;
    }

    Map<String, Material> materials(Tree t, UnitSystem u) {
        Map<String, Material> out = new LinkedHashMap<>();
        for (Tree.Entry e : Fields.named(t, problems, "materials", false, null, "a map of named materials")) {
            String path = "materials." + e.key();
            Fields f = Fields.of(e.value(), path, problems, List.of("E", "density", "alpha"), "a map such as {E: 210 GPa}");
            if (f == null) continue;
            double eModulus = f.quantity("E", Dimension.STRESS, u, true);
            positive(f, "E", eModulus, "a positive modulus of elasticity");
            double density = f.quantity("density", Dimension.WEIGHT_DENSITY, u, false);
            if (f.has("density") && Double.isFinite(density) && density < 0) {
                f.problem(f.at("density"), "density", "is negative; expected a weight density >= 0");
            }
            double alpha = f.quantity("alpha", Dimension.PER_TEMPERATURE, u, false);
            out.put(e.key(), new Material(e.key(), eModulus, f.has("density") ? density : Double.NaN, alpha,
                    e.keyAt()));
        }
        return out;
    }

    private static void positive(Fields f, String key, double v, String expected) {
        if (f.has(key) && !Double.isNaN(v) && !(v > 0 && Double.isFinite(v))) {
            f.problem(f.at(key), key, "is " + v + " in SI; expected " + expected);
        }
    }

    Map<String, Section> sections(Tree t, UnitSystem u, Map<String, Material> materials) {
        Map<String, Section> out = new LinkedHashMap<>();
        for (Tree.Entry e : Fields.named(t, problems, "sections", false, null, "a map of named sections")) {
            String path = "sections." + e.key();
            Fields f = Fields.of(e.value(), path, problems, List.of("A", "I", "depth", "material"),
                    "a map such as {A: 6650 mm2, I: 1.42e8 mm4, material: steel}");
            if (f == null) continue;
            double a = f.quantity("A", Dimension.AREA, u, true);
            positive(f, "A", a, "a positive area");
            double i = f.quantity("I", Dimension.SECOND_MOMENT, u, false);
            positive(f, "I", i, "a positive second moment of area");
            double depth = f.quantity("depth", Dimension.LENGTH, u, false);
            positive(f, "depth", depth, "a positive depth");
            String mat = f.text("material", true, "the name of a material");
            if (mat != null && !materials.containsKey(mat)) {
                f.problem(f.at("material"), "material", Fields.unknown("material", mat, materials.keySet(),
                        "expected one of: " + Fields.sorted(materials.keySet())));
            }
            out.put(e.key(), new Section(e.key(), a, i, depth, mat, e.keyAt()));
        }
        return out;
    }
}
