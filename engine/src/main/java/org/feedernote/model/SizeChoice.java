package org.feedernote.model;

/** A conductor size in mm², or 'auto' for the program to choose. */
public record SizeChoice(boolean auto, double mm2) {
    public static SizeChoice automatic() { return new SizeChoice(true, 0); }
    public static SizeChoice of(double mm2) { return new SizeChoice(false, mm2); }

    /** The record's equality written out, as Circuit's (hashCode stays the record's). */
    @Override public boolean equals(Object o) {
        return o instanceof SizeChoice s && auto == s.auto && Double.compare(mm2, s.mm2) == 0;
    }
}
