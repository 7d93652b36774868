package org.feedernote.model;

import java.util.Map;

/** The design basis: frequency, earthing, limits, ambient temperatures, methods. */
public record Basis(Setting<Double> frequencyHz, Setting<Earthing> earthing,
                    Setting<Double> voltageDropLimitPercent, Map<String, Double> voltageDropLimitsByKind,
                    String voltageDropLimitsPath,
                    Setting<Double> ambientAirC, Setting<Double> ambientGroundC,
                    Setting<ConductorTemperature> conductorTemperature,
                    Setting<Double> disconnectionTimeFinalS, Setting<Double> disconnectionTimeDistributionS,
                    Setting<Double> motorStartingLimitPercent, Setting<DropMethod> voltageDropMethod,
                    Setting<Double> voltageFactorMax, Setting<Double> voltageFactorMin, Double earthElectrodeOhm,
                    Setting<ImpedanceBasis> impedance) {
    /** True when limits are given per load kind rather than one for all. */
    public boolean limitsByKind() { return voltageDropLimitsByKind != null; }
}
