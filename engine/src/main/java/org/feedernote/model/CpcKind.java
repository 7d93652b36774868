package org.feedernote.model;

/**
 * How a multicore or single-core cable's circuit protective conductor (cpc) is made: a core of
 * the cable equal to the line conductors, the reduced bare cpc of a flat twin-and-earth cable
 * (BS 6004), a separate conductor not part of the cable, or the cable's steel-wire armour.
 */
public enum CpcKind implements Token {
    CORE("core"),
    TWIN_AND_EARTH("twin-and-earth"),
    SEPARATE("separate"),
    /** Accepted as a word only to refuse it with the reason: the armour's resistance is not tabulated. */
    ARMOUR("armour");

    private final String token;
    CpcKind(String token) { this.token = token; }
    @Override public String token() { return token; }

    /**
     * IEC 60364-5-54:2011, 543.1.3: a protective conductor not part of a cable is considered
     * protected against mechanical damage when it is installed in conduit or trunking; the
     * reference methods in conduit or trunking are A1, A2, B1 and B2 (IEC 60364-5-52, Table B.52.1).
     * The others (clipped direct, buried, on trays and ladders, in free air) are taken as unprotected.
     */
    public static boolean mechanicallyProtected(Method method) {
        return method == Method.A1 || method == Method.A2 || method == Method.B1 || method == Method.B2;
    }

    /**
     * The smallest separate protective conductor, not part of a cable (IEC 60364-5-54:2011,
     * 543.1.3): copper 2.5 mm² where protected against mechanical damage and 4 mm² where not;
     * aluminium 16 mm² in either case.
     */
    public static double separateMinimumMm2(Conductor conductor, Method method) {
        if (conductor == Conductor.ALUMINIUM) return 16;
        return mechanicallyProtected(method) ? 2.5 : 4;
    }
}
