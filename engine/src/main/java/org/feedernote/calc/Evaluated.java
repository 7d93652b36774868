package org.feedernote.calc;

import org.feedernote.model.Circuit;

/**
 * One evaluation with the no-op trace: the circuit's sizes, the results of the feeders above it
 * it was calculated with, its result and its own figures. A circuit's result depends on nothing
 * else (design currents and the supply are fixed before sizing starts), so an evaluation of an
 * equal circuit under the same feeder results gives the same result: the sizing returns to
 * sizes it has tried (a step undone, the chosen size after a smaller one failed) and the final
 * pass of check repeats the sizing's last evaluations. Under other feeder results the own
 * figures still hold, and only the rest is calculated.
 */
record Evaluated(Circuit circuit, CircuitResult[] upstream, CircuitResult result, Engine.Run.OwnFigures own, Evaluated older) {
    static CircuitResult find(Evaluated e, Circuit c, CircuitResult[] upstream) {
        for (; e != null; e = e.older) {
            if (sameResults(e.upstream, upstream) && same(e.circuit, c)) return e.result;
        }
        return null;
    }

    /**
     * The own figures of an evaluation of an equal circuit, under any feeder results: they do
     * not depend on the circuits upstream (a motor recalculated after a feeder grew, a final
     * circuit in the final pass).
     */
    static Engine.Run.OwnFigures ownFigures(Evaluated e, Circuit c) {
        for (; e != null; e = e.older) if (same(e.circuit, c)) return e.own;
        return null;
    }

    private static boolean same(Circuit a, Circuit b) {
        return a == b || a.equals(b);
    }

    private static boolean sameResults(CircuitResult[] a, CircuitResult[] b) {
        if (a.length != b.length) return false;
        for (int i = 0; i < a.length; i++) if (a[i] != b[i]) return false;
        return true;
    }

    /** The evaluations of circuits equal to c among this and the older ones, or null. */
    Evaluated of(Circuit c) {
        Evaluated rest = older == null ? null : older.of(c);
        if (!same(circuit, c)) return rest;
        return rest == older ? this : new Evaluated(circuit, upstream, result, own, rest);
    }

    /** This and at most n - 1 older evaluations. */
    Evaluated keep(int n) {
        if (older == null) return this;
        if (n <= 1) return new Evaluated(circuit, upstream, result, own, null);
        Evaluated rest = older.keep(n - 1);
        return rest == older ? this : new Evaluated(circuit, upstream, result, own, rest);
    }
}
