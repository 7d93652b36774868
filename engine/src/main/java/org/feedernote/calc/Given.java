package org.feedernote.calc;

import java.util.List;

import org.feedernote.model.Setting;
import org.feedernote.trace.Q;
import org.feedernote.trace.Step;
import org.feedernote.trace.Trace;

/**
 * Records the values a calculation starts from: inputs, defaults, lookups, decisions, notes.
 * Decisions and notes record nothing with the no-op trace; the calculation calls them under
 * {@code if (t.recording())} all the same, so that their texts are not even written for the
 * hundreds of thousands of candidates the sizing evaluates.
 */
final class Given {
    private Given() {}

    static Q input(Trace t, String id, String title, String symbol, double value, String unit, String keyPath) {
        if (!t.recording()) return new Q(id, symbol, value, unit);
        Step.Input s = new Step.Input(id, title, symbol, value, unit, keyPath, Step.Origin.GIVEN, "design input");
        t.add(s);
        return s.q();
    }

    static Q setting(Trace t, String id, String title, String symbol, Setting<Double> setting, String unit, String defaultReference) {
        if (!t.recording()) return new Q(id, symbol, setting.value(), unit);
        Step.Input s = new Step.Input(id, title, symbol, setting.value(), unit, setting.path(),
                setting.given() ? Step.Origin.GIVEN : Step.Origin.DEFAULT,
                setting.given() ? "design input" : defaultReference);
        t.add(s);
        return s.q();
    }

    static Q derived(Trace t, String id, String title, String symbol, double value, String unit, String reference) {
        if (!t.recording()) return new Q(id, symbol, value, unit);
        Step.Input s = new Step.Input(id, title, symbol, value, unit, "", Step.Origin.DERIVED, reference);
        t.add(s);
        return s.q();
    }

    /** As {@link #input(Trace, String, String, String, double, String, String)} for the step owner + step, key path pathOwner + pathStep. */
    static Q input(Trace t, String owner, String step, String title, String symbol, double value, String unit, String pathOwner,
                   String pathStep) {
        Q q = new Q(owner, step, symbol, value, unit);
        if (t.recording()) t.add(new Step.Input(q, title, pathOwner, pathStep, Step.Origin.GIVEN, "design input"));
        return q;
    }

    /** As {@link #setting(Trace, String, String, String, Setting, String, String)} for the step owner + step. */
    static Q setting(Trace t, String owner, String step, String title, String symbol, Setting<Double> setting, String unit,
                     String defaultReference) {
        Q q = new Q(owner, step, symbol, setting.value(), unit);
        if (t.recording()) {
            t.add(new Step.Input(q, title, setting.path(), "", setting.given() ? Step.Origin.GIVEN : Step.Origin.DEFAULT,
                    setting.given() ? "design input" : defaultReference));
        }
        return q;
    }

    /** As {@link #derived(Trace, String, String, String, double, String, String)} for the step owner + step. */
    static Q derived(Trace t, String owner, String step, String title, String symbol, double value, String unit, String reference) {
        Q q = new Q(owner, step, symbol, value, unit);
        if (t.recording()) t.add(new Step.Input(q, title, "", "", Step.Origin.DERIVED, reference));
        return q;
    }

    static Q lookup(Trace t, Step.Lookup step) {
        t.add(step);
        return step.q();
    }

    /** A lookup whose row or column was chosen by the quantity used (its id is read only where the step is recorded). */
    static Q lookupUsing(Trace t, Step.Lookup step, Q used) {
        if (!t.recording()) return step.q();
        Step.Lookup s = new Step.Lookup(step.result(), step.title(), step.table(), step.row(), step.column(), step.method(),
                List.of(used.id()));
        t.add(s);
        return s.q();
    }

    static void decision(Trace t, String id, String title, String because, String outcome, String reference, String... uses) {
        if (t.recording()) t.add(new Step.Decision(id, title, because, outcome, reference, List.of(uses)));
    }

    static void note(Trace t, String id, String title, String text, String reference) {
        if (t.recording()) t.add(new Step.Note(id, title, text, reference));
    }

    /** The quantity q shown by another symbol: the same id and value. */
    static Q alias(String symbol, Q q) {
        return q.as(symbol);
    }

}
