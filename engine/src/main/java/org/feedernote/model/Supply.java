package org.feedernote.model;

/** The supply at the origin. */
public record Supply(double lineVoltageV, double phaseVoltageV, Source source) {

    /** Exactly one kind of source. */
    public sealed interface Source permits Transformer, Utility {}

    /** networkFaultLevelMva: the short-circuit power of the MV network at the primary, null for an infinite network. */
    public record Transformer(double ratingKva, double impedancePercent, Double xrRatio, Double networkFaultLevelMva) implements Source {}

    /** Either or both of the fault level and the external loop impedance may be given. */
    public record Utility(Double faultLevelKa, Double loopImpedanceOhm, Double xrRatio) implements Source {}
}
