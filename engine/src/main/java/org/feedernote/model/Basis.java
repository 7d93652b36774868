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
                    Setting<ImpedanceBasis> impedance, Setting<Double> minimumSizeMm2) {
    /**
     * Where the default smallest line conductor comes from: IEC 60364-5-52:2009, Table 52.2 (from
     * memory) gives 1.5 mm² copper for cables and insulated conductors of fixed power and lighting
     * circuits; the UK note to that table (BS 7671 Table 52.3) allows 1.0 mm² copper for lighting.
     */
    public static final double DEFAULT_MINIMUM_SIZE_MM2 = 1.5;
    public static final String MINIMUM_SIZE_SOURCE = "IEC 60364-5-52:2009, Table 52.2: 1.5 mm² copper for fixed power and lighting circuits";

    /** True when limits are given per load kind rather than one for all. */
    public boolean limitsByKind() { return voltageDropLimitsByKind != null; }
}
