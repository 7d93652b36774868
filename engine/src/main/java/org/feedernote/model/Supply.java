package org.feedernote.model;

/** The supply at the origin. */
public record Supply(double lineVoltageV, double phaseVoltageV, Source source) {

    /** Exactly one kind of source. */
    public sealed interface Source permits Transformer, Utility {}

    public record Transformer(double ratingKva, double impedancePercent, Double xrRatio) implements Source {}

    /** Either or both of the fault level and the external loop impedance may be given. */
    public record Utility(Double faultLevelKa, Double loopImpedanceOhm, Double xrRatio) implements Source {}
}
