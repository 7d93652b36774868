package org.feedernote.trace;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * A trace that keeps every step, in sections, and refuses a step id used twice within a top-level
 * section (a circuit's, the supply's): ids there share the section's prefix, so that is where a
 * clash could arise. Different top-level sections may be written from different threads, one
 * thread per section. TraceSelfCheckTest checks that ids are unique across the whole trace.
 */
public final class TraceRecorder implements Trace {
    private final String id;
    private final String title;
    private final String subtitle;
    private final List<Step> steps = new ArrayList<>();
    private final List<TraceRecorder> children = new ArrayList<>();
    private final Map<String, Step> index;

    public TraceRecorder() {
        this("", "", "", null);
    }

    private TraceRecorder(String id, String title, String subtitle, Map<String, Step> index) {
        this.id = id;
        this.title = title;
        this.subtitle = subtitle;
        this.index = index == null ? new java.util.HashMap<>(256) : index;
    }

    @Override public void add(Step step) {
        if (index.putIfAbsent(step.id(), step) != null) {
            throw new IllegalStateException("step id recorded twice: " + step.id());
        }
        steps.add(step);
    }

    @Override public boolean recording() { return true; }

    @Override public Trace section(String sectionId, String sectionTitle, String sectionSubtitle) {
        // A top-level section keeps its own index; its sub-sections share it.
        TraceRecorder child = new TraceRecorder(sectionId, sectionTitle, sectionSubtitle, id.isEmpty() ? null : index);
        children.add(child);
        return child;
    }

    /** The recorded steps, frozen. */
    public Section toSection() {
        return new Section(id, title, subtitle, List.copyOf(steps),
                children.stream().map(TraceRecorder::toSection).toList());
    }
}
