package org.feedernote.formula;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.function.Function;

import org.feedernote.expr.Var;
import org.feedernote.trace.Q;
import org.feedernote.trace.Step;
import org.feedernote.trace.Trace;

/**
 * Formulas over a varying number of terms: a sum of drops along a path, a product of correction
 * factors, impedances in series. With a recording trace the variables carry the symbols of the
 * quantities they stand for, as the working shows them. The same formula over anonymous
 * variables is made once per kind, result symbol and number of terms and kept: the same
 * expression with its operations in the same order, hence the same value. It values every
 * evaluation, so that neither a sizing candidate nor a recorded step compiles a tree of its own.
 * One per engine; safe to share between threads.
 */
public final class TermFormulas {
    /**
     * equals and hashCode are written out: a record's own are linked through method handles,
     * which the first JIT tier (the command line's) runs several times slower, and every sizing
     * candidate looks keys up.
     */
    private record Key(String kind, String symbol, int terms) {
        @Override public boolean equals(Object o) {
            return o instanceof Key k && terms == k.terms && kind.equals(k.kind) && symbol.equals(k.symbol);
        }

        @Override public int hashCode() {
            return (kind.hashCode() * 31 + symbol.hashCode()) * 31 + terms;
        }
    }

    private record Made(Formula formula, List<Var> vars) {}

    private final Map<Key, Made> made = new ConcurrentHashMap<>();

    /**
     * Evaluates the formula make builds over one variable per quantity.
     *
     * @param kind   what make builds (a formula id): with symbol and the number of terms it names
     *               the formula kept for the no-op trace, so make must build the same expression
     *               for the same kind, symbol and count
     * @param symbol the result's symbol, as make gives it
     */
    public Q eval(Trace trace, String stepId, String form, String kind, String symbol, String keyPrefix, String unit,
                  List<Q> quantities, Function<List<Var>, Formula> make) {
        return eval(trace, stepId, "", form, kind, symbol, keyPrefix, unit, quantities, make);
    }

    /** As above, for the step owner + part: joined only where the step is recorded or its id read. */
    public Q eval(Trace trace, String owner, String part, String form, String kind, String symbol, String keyPrefix, String unit,
                  List<Q> quantities, Function<List<Var>, Formula> make) {
        Made m = made.computeIfAbsent(new Key(kind, symbol, quantities.size()), k -> {
            List<Var> vars = new ArrayList<>();
            for (int i = 0; i < k.terms(); i++) vars.add(new Var(keyPrefix + i, keyPrefix + i, unit));
            Formula twin = make.apply(List.copyOf(vars));
            if (!twin.vars().equals(vars)) {
                throw new IllegalStateException(kind + ": the formula must use each term once, in order");
            }
            return new Made(twin, List.copyOf(vars));
        });
        Step.Binding[] bindings = new Step.Binding[quantities.size()];
        if (trace.recording()) {
            // Variables named after the quantities they stand for, as the working shows them; the
            // formula over them is valued by the kept twin, the same tree over anonymous variables.
            List<Var> shown = new ArrayList<>(bindings.length);
            for (int i = 0; i < bindings.length; i++) {
                Q q = quantities.get(i);
                Var v = new Var(m.vars().get(i).key(), q.symbol(), unit);
                shown.add(v);
                bindings[i] = Formula.bind(v, q);
            }
            List<Var> vars = Collections.unmodifiableList(shown);
            return make.apply(vars).evalLike(m.formula(), vars, trace, owner + part, form, bindings);
        }
        for (int i = 0; i < bindings.length; i++) bindings[i] = Formula.bind(m.vars().get(i), quantities.get(i));
        return m.formula().eval(trace, owner, part, form, bindings);
    }
}
