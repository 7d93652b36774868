package org.feedernote.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.lang.reflect.Constructor;
import java.lang.reflect.RecordComponent;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;

import org.feedernote.Fixtures;
import org.feedernote.input.InputReader;

/**
 * Circuit, Cable and SizeChoice write their equality out (the generated one is slow under the
 * command line's JIT tier), and the sizing's memo of evaluations trusts it: two circuits it calls
 * equal must agree in every part, or a kept result would be returned for another circuit. This
 * holds the written-out equality to the record's own definition, component by component, so that
 * a component added later and forgotten in equals fails here.
 */
class WrittenOutEqualityTest {
    @Test
    void circuitsDifferingInAnyOneComponentAreNotEqual() throws Exception {
        List<Object> circuits = new ArrayList<>();
        for (Path example : Fixtures.examples().toList()) circuits.addAll(InputReader.read(example).circuits());
        assertEveryComponentCounts(Circuit.class, circuits);
    }

    @Test
    void cablesDifferingInAnyOneComponentAreNotEqual() throws Exception {
        List<Object> cables = new ArrayList<>();
        for (Path example : Fixtures.examples().toList()) {
            for (Circuit c : InputReader.read(example).circuits()) cables.add(c.cable());
        }
        assertEveryComponentCounts(Cable.class, cables);
    }

    @Test
    void sizeChoicesDifferingInAnyOneComponentAreNotEqual() throws Exception {
        assertEveryComponentCounts(SizeChoice.class, List.of(SizeChoice.of(2.5), SizeChoice.automatic()));
    }

    /** For each instance and component: an equal copy is equal; a copy with that component changed is not. */
    private static void assertEveryComponentCounts(Class<?> type, List<Object> instances) throws Exception {
        RecordComponent[] components = type.getRecordComponents();
        Class<?>[] types = new Class<?>[components.length];
        for (int i = 0; i < components.length; i++) types[i] = components[i].getType();
        Constructor<?> make = type.getDeclaredConstructor(types);
        boolean[] varied = new boolean[components.length];
        for (Object base : instances) {
            Object[] args = new Object[components.length];
            for (int i = 0; i < components.length; i++) args[i] = components[i].getAccessor().invoke(base);
            assertEquals(base, make.newInstance(args), "an equal copy of " + base);
            for (int i = 0; i < components.length; i++) {
                Object other = different(components, i, args[i], instances);
                if (other == NONE) continue;
                Object[] changedArgs = args.clone();
                changedArgs[i] = other;
                assertNotEquals(base, make.newInstance(changedArgs), type.getSimpleName() + "." + components[i].getName() + " changed");
                varied[i] = true;
            }
        }
        for (int i = 0; i < components.length; i++) {
            assertTrue(varied[i], type.getSimpleName() + "." + components[i].getName() + " was never varied");
        }
    }

    private static final Object NONE = new Object();

    /** A value of component i unlike the given one: a primitive moved, a reference set to null or taken from another instance. */
    private static Object different(RecordComponent[] components, int i, Object value, List<Object> instances) throws Exception {
        Class<?> t = components[i].getType();
        if (t == double.class) return (Double) value + 1;
        if (t == int.class) return (Integer) value + 1;
        if (t == boolean.class) return !(Boolean) value;
        if (value != null) return null;
        for (Object other : instances) {
            Object v = components[i].getAccessor().invoke(other);
            if (v != null) return v;
        }
        if (t == String.class) return "X";
        if (t == Double.class) return 1.0;
        return NONE;
    }
}
