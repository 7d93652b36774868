package org.feedernote.model;

/** Installation conditions of a circuit's cable. */
public record Conditions(Method method, Setting<Double> ambientC, int groupedCircuits, Arrangement groupArrangement,
                         double thermalInsulationMm, Setting<Double> soilResistivityKmW, Double thirdHarmonicPercent,
                         Orientation orientation) {
    /** Method G with its cables spaced vertically (the lower tabulated capacity). */
    public boolean vertical() {
        return method == Method.G && orientation == Orientation.VERTICAL;
    }
}
