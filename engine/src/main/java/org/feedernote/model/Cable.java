package org.feedernote.model;

/** The cable of a circuit. cores is 0 for single-core cables; formation is null for multicore. */
public record Cable(Conductor conductor, Insulation insulation, CableType type, int cores, SizeChoice size,
                    SizeChoice cpc, int parallel, Formation formation) {
    public Cable withSize(double mm2) { return new Cable(conductor, insulation, type, cores, SizeChoice.of(mm2), cpc, parallel, formation); }
    public Cable withCpc(double mm2) { return new Cable(conductor, insulation, type, cores, size, SizeChoice.of(mm2), parallel, formation); }

    /** The record's equality written out, as Circuit's (hashCode stays the record's). */
    @Override public boolean equals(Object o) {
        if (o == this) return true;
        return o instanceof Cable c && java.util.Objects.equals(size, c.size) && java.util.Objects.equals(cpc, c.cpc) && conductor == c.conductor && insulation == c.insulation
                && type == c.type && cores == c.cores && parallel == c.parallel && formation == c.formation;
    }
}
