package org.feedernote.formula;

/** Unit symbols used by the formula catalogue and the trace; one spelling each. */
public final class Units {
    private Units() {}

    public static final String NONE = "";
    public static final String A = "A";
    public static final String V = "V";
    public static final String KW = "kW";
    public static final String KVAR = "kvar";
    public static final String KVA = "kVA";
    public static final String PERCENT = "%";
    public static final String M = "m";
    public static final String MM = "mm";
    public static final String MM2 = "mm²";
    public static final String DEG_C = "°C";
    public static final String PER_K = "1/K";
    public static final String HZ = "Hz";
    public static final String OHM = "Ω";
    public static final String OHM_PER_KM = "Ω/km";
    public static final String MH_PER_KM = "mH/km";
    public static final String MV_PER_AM = "mV/A/m";
    public static final String KA = "kA";
    public static final String S = "s";
}
