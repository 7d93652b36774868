package org.feedernote.model;

/** What a final circuit supplies. Exactly one of power, apparent power or current is given. */
public record Load(LoadKind kind, Double powerKw, Double apparentKva, Double currentA, Double powerFactor,
                   Double efficiency, int phases, Double startingCurrentMultiple, Setting<Double> startingPowerFactor) {}
