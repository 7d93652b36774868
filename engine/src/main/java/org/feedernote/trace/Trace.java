package org.feedernote.trace;

/**
 * Where steps are recorded. Passed explicitly; there is no global collector. {@link #noop()}
 * records nothing and serves hot loops that only need numbers (sizing candidates); the chosen
 * candidate is then recomputed with a recording trace.
 */
public interface Trace {

    /** Records a step (or drops it, for the no-op trace). */
    void add(Step step);

    /** False for the no-op trace: callers may skip building text that nobody will read. */
    boolean recording();

    /** A sub-section; steps added to the returned trace land in it. */
    Trace section(String id, String title, String subtitle);

    /**
     * Nothing more will be added to this section or its sub-sections. A recording trace makes
     * the section now, while its steps are still fresh in memory, rather than when the whole
     * trace is collected.
     */
    default void complete() {}

    static Trace noop() {
        return Noop.INSTANCE;
    }

    /** The trace that records nothing. */
    enum Noop implements Trace {
        INSTANCE;

        @Override public void add(Step step) {}
        @Override public boolean recording() { return false; }
        @Override public Trace section(String id, String title, String subtitle) { return this; }
    }
}
