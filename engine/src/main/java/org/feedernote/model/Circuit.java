package org.feedernote.model;

/** A circuit: a feeder when 'to' names a board, a final circuit when it has a load. */
public record Circuit(String id, String description, String from, String to, Load load, Phase phase, double lengthM,
                      Cable cable, Conditions conditions, Device device, Double designCurrentA, Where where) {
    public boolean isFeeder() { return to != null; }

    /** A feeder to a single-phase board (a 2-core cable, or a 3-core one with its phase given): its phase is L1, L2, L3 or auto. */
    public boolean singlePhaseFeeder() { return to != null && phase != null; }

    /** 1 or 3: a final circuit's load's, a feeder's by its board (null phase: three-phase). */
    public int phases() { return to != null ? (phase != null ? 1 : 3) : load.phases(); }
    public Circuit withCable(Cable c) { return new Circuit(id, description, from, to, load, phase, lengthM, c, conditions, device, designCurrentA, where); }

    /**
     * The record's equality, written out: the generated one is linked through method handles,
     * which the first JIT tier (the command line's) runs several times slower, and the sizing
     * compares candidates with the circuits it has evaluated. The cable, where candidates differ,
     * first; the other parts are mostly the same objects. (hashCode stays the record's, which
     * agrees with this.)
     */
    @Override public boolean equals(Object o) {
        if (o == this) return true;
        return o instanceof Circuit c && java.util.Objects.equals(cable, c.cable) && Double.compare(lengthM, c.lengthM) == 0 && java.util.Objects.equals(id, c.id)
                && java.util.Objects.equals(description, c.description) && java.util.Objects.equals(from, c.from)
                && java.util.Objects.equals(to, c.to) && java.util.Objects.equals(load, c.load) && phase == c.phase
                && java.util.Objects.equals(conditions, c.conditions) && java.util.Objects.equals(device, c.device)
                && java.util.Objects.equals(designCurrentA, c.designCurrentA) && java.util.Objects.equals(where, c.where);
    }
}
