package org.feedernote.calc;

import org.feedernote.trace.Q;

/**
 * A board's diversified demand on each phase: P and Q summed as complex power, plus apparent
 * power of loads whose power factor is unknown (added arithmetically, which overstates and so
 * is on the safe side). Entries are null where nothing contributes.
 */
record PhaseDemand(Q[] p, Q[] q, Q[] unknownS) {
    boolean hasUnknown(int k) { return unknownS[k] != null; }
}
