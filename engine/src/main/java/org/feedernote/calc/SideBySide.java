package org.feedernote.calc;

import java.util.List;
import java.util.function.Function;

/**
 * Work on circuits that do not depend on one another, run side by side (on more than a handful),
 * with what each gave or threw kept in input order: the caller takes the outcomes in that order,
 * so the first data gap it meets is the one a run of one circuit after another would report.
 */
final class SideBySide {
    private SideBySide() {}

    /** What the work gave for one item, or what it threw. */
    record Outcome<R>(R value, RuntimeException error) {
        /** The value, or the error thrown now. */
        R get() {
            if (error != null) throw error;
            return value;
        }
    }

    static <T, R> List<Outcome<R>> map(List<T> items, Function<T, R> work) {
        return (items.size() > 8 ? items.parallelStream() : items.stream()).map(item -> {
            try {
                return new Outcome<R>(work.apply(item), null);
            } catch (RuntimeException e) {
                return new Outcome<R>(null, e);
            }
        }).toList();
    }
}
