package org.feedernote.trace;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;

import org.junit.jupiter.api.Test;

/** A section's steps and a step's bindings are read-only views of the first places of an array. */
class ArrayViewTest {

    @Test
    void showsTheFirstPlacesOnlyAndEqualsAListOfThem() {
        ArrayView<String> view = new ArrayView<>(new String[] {"a", "b", null}, 2);
        assertEquals(List.of("a", "b"), view);
        assertEquals(List.of("a", "b").hashCode(), view.hashCode());
        assertThrows(IndexOutOfBoundsException.class, () -> view.get(2));
    }

    @Test
    void cannotBeChanged() {
        ArrayView<String> view = new ArrayView<>(new String[] {"a"}, 1);
        assertThrows(UnsupportedOperationException.class, () -> view.add("b"));
        assertThrows(UnsupportedOperationException.class, () -> view.set(0, "b"));
    }
}
