package org.feedernote.model;

/**
 * The cable of a circuit. cores is 0 for single-core cables; formation is null for multicore.
 * cpcKind is how the protective conductor is made: as the input states it (cpcKindStated), or
 * the default the reader derived from the cable and the circuit; null where the input gives
 * cpc_mm2 without a kind and the default cannot tell (the conductor is then taken to run with the
 * cable, as before the kind existed).
 */
public record Cable(Conductor conductor, Insulation insulation, CableType type, int cores, SizeChoice size,
                    SizeChoice cpc, int parallel, Formation formation, CpcKind cpcKind, boolean cpcKindStated) {
    public Cable withSize(double mm2) { return new Cable(conductor, insulation, type, cores, SizeChoice.of(mm2), cpc, parallel, formation, cpcKind, cpcKindStated); }
    public Cable withCpc(double mm2) { return new Cable(conductor, insulation, type, cores, size, SizeChoice.of(mm2), parallel, formation, cpcKind, cpcKindStated); }

    /** Whether the protective conductor is a separate conductor, not part of the cable. */
    public boolean separateCpc() { return cpcKind == CpcKind.SEPARATE; }

    /** The record's equality written out, as Circuit's (hashCode stays the record's). */
    @Override public boolean equals(Object o) {
        if (o == this) return true;
        return o instanceof Cable c && java.util.Objects.equals(size, c.size) && java.util.Objects.equals(cpc, c.cpc) && conductor == c.conductor && insulation == c.insulation
                && type == c.type && cores == c.cores && parallel == c.parallel && formation == c.formation && cpcKind == c.cpcKind
                && cpcKindStated == c.cpcKindStated;
    }
}
