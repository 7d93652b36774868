package org.feedernote.trace;

import java.util.ArrayList;
import java.util.List;

/** Flattens a trace into its steps, in document order. */
public final class TraceWalk {
    private TraceWalk() {}

    public static List<Step> steps(Section root) {
        List<Step> out = new ArrayList<>();
        collect(root, out);
        return out;
    }

    private static void collect(Section s, List<Step> out) {
        out.addAll(s.steps());
        for (Section c : s.sections()) collect(c, out);
    }
}
