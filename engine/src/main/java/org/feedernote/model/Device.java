package org.feedernote.model;

/** The protective device at the origin of a circuit. ratingA is null for 'auto'. */
public record Device(DeviceKind kind, Double ratingA, Curve curve, Double instantaneousA, Double breakingCapacityKa,
                     Double disconnectionCurrentA, Double rcdResidualA, Double letThroughA2s, Protection protection,
                     ResidualType residualType, Double longTimeA, Double shortTimeA, Double shortTimeDelayS, Backup backup) {

    /**
     * Back-up protection (IEC 60364-4-43:2008, 434.5.1): the device of the feeder upstreamCircuit,
     * with this one, breaks combinedBreakingCapacityKa (the manufacturer's series or cascade value).
     */
    public record Backup(String upstreamCircuit, double combinedBreakingCapacityKa) {}

    /** As the design input gives it, without back-up protection. */
    public Device(DeviceKind kind, Double ratingA, Curve curve, Double instantaneousA, Double breakingCapacityKa,
                  Double disconnectionCurrentA, Double rcdResidualA, Double letThroughA2s, Protection protection,
                  ResidualType residualType, Double longTimeA, Double shortTimeA, Double shortTimeDelayS) {
        this(kind, ratingA, curve, instantaneousA, breakingCapacityKa, disconnectionCurrentA, rcdResidualA, letThroughA2s, protection,
                residualType, longTimeA, shortTimeA, shortTimeDelayS, null);
    }

    /** As the design input gives it without the optional protection and residual type: the usual device. */
    public Device(DeviceKind kind, Double ratingA, Curve curve, Double instantaneousA, Double breakingCapacityKa,
                  Double disconnectionCurrentA, Double rcdResidualA, Double letThroughA2s) {
        this(kind, ratingA, curve, instantaneousA, breakingCapacityKa, disconnectionCurrentA, rcdResidualA, letThroughA2s,
                Protection.OVERLOAD_AND_FAULT, ResidualType.GENERAL, null, null, null);
    }

    /** True where the device protects against fault only (a separate overload relay protects against overload). */
    public boolean faultProtectionOnly() {
        return protection == Protection.FAULT_ONLY;
    }

    /** True for a time-delayed (type S) residual-current part. */
    public boolean rcdTimeDelayed() {
        return residualType == ResidualType.S;
    }

    public Device withRating(double rating) {
        return new Device(kind, rating, curve, instantaneousA, breakingCapacityKa, disconnectionCurrentA, rcdResidualA, letThroughA2s,
                protection, residualType, longTimeA, shortTimeA, shortTimeDelayS, backup);
    }

    /** The current setting of the overload release: an MCCB's long-time setting where given, else the rated current (null for auto). */
    public Double overloadSettingA() {
        return longTimeA != null ? longTimeA : ratingA;
    }
}
