package org.feedernote.model;

/** A circuit: a feeder when 'to' names a board, a final circuit when it has a load. */
public record Circuit(String id, String description, String from, String to, Load load, Phase phase, double lengthM,
                      Cable cable, Conditions conditions, Device device, Double designCurrentA, Where where) {
    public boolean isFeeder() { return to != null; }
    public Circuit withCable(Cable c) { return new Circuit(id, description, from, to, load, phase, lengthM, c, conditions, device, designCurrentA, where); }
}
