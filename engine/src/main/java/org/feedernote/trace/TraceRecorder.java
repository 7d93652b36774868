package org.feedernote.trace;

import java.util.ArrayList;
import java.util.List;

/**
 * A trace that keeps every step, in sections. With assertions on (every test run), it refuses a
 * step id used twice within a top-level section (a circuit's, the supply's): ids there share the
 * section's prefix, so that is where a clash could arise. Different top-level sections may be
 * written from different threads, one thread per section. TraceSelfCheckTest checks that ids are
 * unique across the whole trace.
 *
 * <p>Why only with assertions: a step's id is the owner's id (unique by the input's rules) and a
 * part the engine writes, so a clash is a fault of the engine, which the tests find; hashing every
 * freshly joined id cost an eighth of a traced check.
 */
public final class TraceRecorder implements Trace {
    private final String id;
    private final String title;
    private final String subtitle;
    /** The steps so far, in the first size places (an array, so that the section can be a view of it). */
    private Step[] steps = NONE;
    private int size;
    private static final Step[] NONE = new Step[0];
    /** Made with the first sub-section: most sections have none. */
    private List<TraceRecorder> children;
    /** Set when the section is made: the steps are the section's from then on. */
    private boolean frozen;
    /** The section, once made. */
    private Section section;
    /** The ids of the top-level section, kept when assertions are on; else null. */
    private final IdSet index;
    private static final boolean IDS_CHECKED = TraceRecorder.class.desiredAssertionStatus();

    public TraceRecorder() {
        this("", "", "", null);
    }

    private TraceRecorder(String id, String title, String subtitle, IdSet index) {
        this.id = id;
        this.title = title;
        this.subtitle = subtitle;
        this.index = !IDS_CHECKED ? null : index == null ? new IdSet() : index;
    }

    @Override public void add(Step step) {
        refuseIfFrozen();
        if (IDS_CHECKED && !index.add(step.id())) {
            throw new IllegalStateException("step id recorded twice: " + step.id());
        }
        if (size == steps.length) steps = java.util.Arrays.copyOf(steps, size == 0 ? 12 : size + (size >> 1));
        steps[size++] = step;
    }

    @Override public boolean recording() { return true; }

    @Override public Trace section(String sectionId, String sectionTitle, String sectionSubtitle) {
        refuseIfFrozen();
        // A top-level section keeps its own index; its sub-sections share it.
        TraceRecorder child = new TraceRecorder(sectionId, sectionTitle, sectionSubtitle, id.isEmpty() ? null : index);
        if (children == null) children = new ArrayList<>(4);
        children.add(child);
        return child;
    }

    /**
     * The step ids of a top-level section: a set in one array (open addressing), without the entry
     * object a hash set keeps per id, since the index lives as long as the trace and every young
     * collection of a large traced run copies it.
     */
    private static final class IdSet {
        private String[] slots = new String[256];
        private int size;

        boolean add(String stepId) {
            if (2 * (size + 1) > slots.length) grow();
            if (!insert(slots, stepId)) return false;
            size++;
            return true;
        }

        private static boolean insert(String[] table, String stepId) {
            int mask = table.length - 1;
            for (int i = spread(stepId.hashCode()) & mask; ; i = (i + 1) & mask) {
                String there = table[i];
                if (there == null) {
                    table[i] = stepId;
                    return true;
                }
                if (there.equals(stepId)) return false;
            }
        }

        private static int spread(int h) {
            return h ^ (h >>> 16);
        }

        private void grow() {
            String[] larger = new String[slots.length * 2];
            for (String s : slots) if (s != null) insert(larger, s);
            slots = larger;
        }
    }

    @Override public void complete() {
        toSection();
    }

    /** The recorded steps, frozen. */
    public Section toSection() {
        if (section != null) return section;
        // The section takes the recorder's own lists, read-only, rather than copies of them: after
        // this the recorder refuses more steps and sections, so the section cannot change.
        frozen = true;
        List<Section> sections = List.of();
        if (children != null) {
            List<Section> made = new ArrayList<>(children.size());
            for (TraceRecorder c : children) made.add(c.toSection());
            sections = java.util.Collections.unmodifiableList(made);
        }
        section = new Section(id, title, subtitle, new ArrayView<>(steps, size), sections);
        return section;
    }

    private void refuseIfFrozen() {
        if (frozen) throw new IllegalStateException("the trace of " + (id.isEmpty() ? "the run" : id) + " is already frozen");
    }
}
