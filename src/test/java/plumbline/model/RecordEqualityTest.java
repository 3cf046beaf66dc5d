package plumbline.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.lang.reflect.Constructor;
import java.lang.reflect.RecordComponent;
import java.util.Arrays;
import java.util.Objects;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import plumbline.units.Dimension;

/**
 * The records whose equals and hashCode are written out by hand (to spare a short run the
 * linking of the generated ones) keep the meaning the language gives a record: equal exactly
 * when every component is equal, a double compared as {@code Double.compare} does (NaN equals
 * NaN, 0.0 differs from -0.0), equal records with equal hash codes. The reference is the
 * record's own components read by reflection (the definition in the Java Language
 * Specification, section 8.10.3, from memory), so a component added later and left out of the
 * hand-written methods fails here.
 */
class RecordEqualityTest {

    /** Two different values of each component type, the first also the base value. */
    private static Object[] values(Class<?> type) {
        if (type == double.class) return new Object[]{1.5, 2.5, Double.NaN, 0.0, -0.0};
        if (type == int.class) return new Object[]{3, 4};
        if (type == boolean.class) return new Object[]{true, false};
        if (type == String.class) return new Object[]{"A", "B", null};
        if (type == SourceRef.class) return new Object[]{new SourceRef("m.yaml", 3, 5), new SourceRef("m.yaml", 4, 5), null};
        throw new AssertionError("no test values for " + type);
    }

    private static Object make(Constructor<?> c, Object[] args) throws Exception {
        return c.newInstance(args.clone());
    }

    /** Equality by the record's definition: every component equal (boxed doubles compare their bits). */
    private static boolean byComponents(Object a, Object b) throws Exception {
        if (b == null || a.getClass() != b.getClass()) return false;
        for (RecordComponent rc : a.getClass().getRecordComponents()) {
            if (!Objects.equals(rc.getAccessor().invoke(a), rc.getAccessor().invoke(b))) return false;
        }
        return true;
    }

    @ParameterizedTest
    @ValueSource(classes = {Dimension.class, Support.class, Material.class, Section.class, SourceRef.class})
    void handWrittenEqualsIsTheRecordsOwn(Class<?> type) throws Exception {
        assertTrue(type.isRecord());
        assertEquals(type, type.getDeclaredMethod("equals", Object.class).getDeclaringClass(), "the test only means something for a hand-written equals");
        RecordComponent[] rcs = type.getRecordComponents();
        Class<?>[] types = Arrays.stream(rcs).map(RecordComponent::getType).toArray(Class<?>[]::new);
        Constructor<?> c = type.getDeclaredConstructor(types);
        Object[] base = new Object[rcs.length];
        for (int i = 0; i < rcs.length; i++) base[i] = values(types[i])[0];
        Object a = make(c, base), same = make(c, base);
        assertEquals(a, same);
        assertEquals(a.hashCode(), same.hashCode());
        assertNotEquals(a, null);
        assertNotEquals(a, "not a " + type.getSimpleName());
        int checked = 0;
        for (int i = 0; i < rcs.length; i++) {
            for (Object v : values(types[i])) {
                for (Object w : values(types[i])) {
                    Object[] x = base.clone(), y = base.clone();
                    x[i] = v;
                    y[i] = w;
                    Object p = make(c, x), q = make(c, y);
                    boolean expected = byComponents(p, q);
                    assertEquals(expected, p.equals(q), type.getSimpleName() + "." + rcs[i].getName() + ": " + v + " against " + w);
                    if (expected) assertEquals(p.hashCode(), q.hashCode(), type.getSimpleName() + "." + rcs[i].getName());
                    checked++;
                }
            }
        }
        assertTrue(checked >= 4 * rcs.length);
        // every component takes part: changing any one alone makes the records differ
        for (int i = 0; i < rcs.length; i++) {
            Object[] x = base.clone();
            x[i] = values(types[i])[1];
            assertNotEquals(a, make(c, x), type.getSimpleName() + "." + rcs[i].getName() + " is left out of equals");
        }
    }
}
