package org.feedernote.formula;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;

import org.feedernote.expr.Evaluator;
import org.feedernote.expr.Expr;
import org.feedernote.expr.Var;
import org.feedernote.trace.ArrayView;
import org.feedernote.trace.Q;
import org.feedernote.trace.Step;
import org.feedernote.trace.Trace;

/**
 * One formula of the catalogue: the result's symbol and unit, the expression tree and the
 * reference it comes from. The only way the engine obtains a computed number is {@link #eval},
 * which records the step and returns the value. Immutable; the variables of the tree are found,
 * and the tree compiled, once, when the formula is first evaluated: a sum shown over the
 * quantities of one circuit is made for that circuit and valued by its kept twin (see
 * {@link #evalLike}), so it never needs either.
 */
public final class Formula {
    private final String id;
    private final String title;
    private final String symbol;
    private final String unit;
    private final Expr expr;
    private final String reference;
    /** Null until first needed; then the same for every thread (a benign race: each would make equal ones). */
    private Prepared prepared;

    /** The variables in order of first appearance, and the tree compiled against them. */
    private record Prepared(List<Var> vars, Evaluator.Compiled compiled) {}

    public Formula(String id, String title, String symbol, String unit, Expr expr, String reference) {
        this.id = id;
        this.title = title;
        this.symbol = symbol;
        this.unit = unit;
        this.expr = expr;
        this.reference = reference;
    }

    public String id() { return id; }
    public String title() { return title; }
    public String symbol() { return symbol; }
    public String unit() { return unit; }
    public Expr expr() { return expr; }
    public String reference() { return reference; }

    /** The variables the expression refers to, in order of first appearance. */
    public List<Var> vars() {
        return prepared().vars();
    }

    private Prepared prepared() {
        Prepared p = prepared;
        if (p == null) {
            Set<Var> found = new LinkedHashSet<>();
            collect(expr, found);
            List<Var> vars = List.copyOf(found);
            p = new Prepared(vars, Evaluator.compile(expr, vars));
            prepared = p;
        }
        return p;
    }

    private static void collect(Expr e, Set<Var> out) {
        e.accept(new Expr.Visitor<Void>() {
            @Override public Void ref(Expr.Ref ref) { out.add(ref.var()); return null; }
            @Override public Void num(Expr.Num num) { return null; }
            @Override public Void bin(Expr.Bin bin) { bin.left().accept(this); bin.right().accept(this); return null; }
            @Override public Void call(Expr.Call call) { call.arg().accept(this); return null; }
        });
    }

    /**
     * The index of the binding of a variable, or -1: by identity first (catalogue variables are
     * shared constants), then by key; the identity search starts at from, where bindings given in
     * the order of the variables (perhaps rotated, the factor last) have it.
     */
    private static int find(Step.Binding[] bindings, Var v, int from) {
        int n = bindings.length;
        for (int k = 0; k < n; k++) {
            int j = from + k < n ? from + k : from + k - n;
            if (bindings[j].var() == v) return j;
        }
        for (int j = 0; j < n; j++) if (bindings[j].var().key().equals(v.key())) return j;
        return -1;
    }

    public static Step.Binding bind(Var var, Q q) {
        return new Step.Binding(var, q);
    }

    /**
     * Evaluates the formula with the given bindings, records a formula step under {@code stepId}
     * and returns its value.
     *
     * @param form why this form of the formula applies (shown on the step's heading), or ""
     */
    public Q eval(Trace trace, String stepId, String form, Step.Binding... bindings) {
        return eval(trace, stepId, "", form, bindings);
    }

    /** As {@link #eval(Trace, String, String, Step.Binding...)} with the result shown by another symbol (S_L1 rather than S). */
    public Q evalAs(String resultSymbol, Trace trace, String stepId, String form, Step.Binding... bindings) {
        return evalAs(resultSymbol, trace, stepId, "", form, bindings);
    }

    /** As {@link #eval(Trace, String, String, String, Step.Binding...)} with the result shown by another symbol, without a copy of the formula. */
    public Q evalAs(String resultSymbol, Trace trace, String owner, String step, String form, Step.Binding... bindings) {
        return evaluate(resultSymbol, trace, owner, step, form, bindings);
    }

    /**
     * As {@link #eval(Trace, String, String, Step.Binding...)} for the step owner + step (a
     * circuit's id and the step's own part, "C-12" and "/vd/dU"): the two are joined only where
     * the id is read, never for the no-op trace of a sizing candidate.
     */
    public Q eval(Trace trace, String owner, String step, String form, Step.Binding... bindings) {
        return evaluate(symbol, trace, owner, step, form, bindings);
    }

    private Q evaluate(String resultSymbol, Trace trace, String owner, String step, String form, Step.Binding... bindings) {
        if (UNITS_ALWAYS_CHECKED || trace.recording()) requireUnits(owner, step, bindings);
        Prepared p = prepared();
        List<Var> vars = p.vars();
        double[] values = new double[vars.size()];
        // Bindings found by identity are of this formula: when every binding was, none need be asked about.
        int identical = 0;
        int next = 0;
        for (int i = 0; i < values.length; i++) {
            Var v = vars.get(i);
            // Bindings are mostly given in the order of the variables: a sum over many terms stays linear.
            int j = find(bindings, v, next);
            if (j < 0) throw new IllegalStateException(owner + step + ": formula " + id + " needs " + vars.get(i).symbol() + " bound");
            values[i] = bindings[j].q().value();
            if (bindings[j].var() == v) identical++;
            next = j + 1;
        }
        double value = p.compiled().evaluate(values, owner, step);
        Q q = new Q(owner, step, resultSymbol, value, unit);
        if (trace.recording()) {
            // The bindings of variables of this formula, in the order given (mostly the variables' own).
            Step.Binding[] used = bindings;
            int n = bindings.length;
            if (identical < bindings.length) {
                used = new Step.Binding[bindings.length];
                n = 0;
                Set<Var> known = vars.size() > 8 ? new java.util.HashSet<>(vars) : null;
                for (Step.Binding b : bindings) {
                    if (known != null ? known.contains(b.var()) : vars.contains(b.var())) used[n++] = b;
                }
            }
            trace.add(new Step.Formula(q, title, id, expr, new ArrayView<>(used, n),
                    form, reference));
        }
        return q;
    }

    /**
     * As {@link #eval(Trace, String, String, Step.Binding...)}, valued by the compiled tree of
     * twin: the formula the same function made over other variables, kept so that a formula made
     * afresh for each use (a sum over a path's terms) is not compiled each time. Both trees have
     * the same operations in the same order, so the value is the one this formula's own tree
     * gives (and the one a sizing candidate got).
     *
     * @param vars     this formula's variables in the order of the twin's (as the function made them)
     * @param bindings one for each of vars, by identity, in any order; recorded in the order given
     */
    public Q evalLike(Formula twin, List<Var> vars, Trace trace, String stepId, String form, Step.Binding[] bindings) {
        List<Var> twinVars = twin.vars();
        if (twinVars.size() != vars.size() || bindings.length != vars.size()) {
            throw new IllegalStateException(stepId + ": formula " + id + " has " + twinVars.size() + " variables, "
                    + vars.size() + " named and " + bindings.length + " bound");
        }
        if (UNITS_ALWAYS_CHECKED || trace.recording()) requireUnits(stepId, "", bindings);
        double[] values = new double[bindings.length];
        int next = 0;
        for (int i = 0; i < values.length; i++) {
            Var v = vars.get(i);
            int j = find(bindings, v, next);
            if (j < 0 || bindings[j].var() != v) {
                throw new IllegalStateException(stepId + ": formula " + id + " needs " + v.symbol() + " bound");
            }
            values[i] = bindings[j].q().value();
            next = j + 1;
        }
        double value = twin.prepared().compiled().evaluate(values, stepId, "");
        Q q = new Q(stepId, symbol, value, unit);
        if (trace.recording()) {
            trace.add(new Step.Formula(q, title, id, expr, new ArrayView<>(bindings, bindings.length), form, reference));
        }
        return q;
    }

    /**
     * Units are checked on every evaluation the trace records, and, with assertions on (every
     * test run), on the no-op trace's too. A unit follows from the call site, not from the
     * design's figures (the same code makes the quantity whatever the sizes), so a mismatch is a
     * fault of the engine, which the tests meet on either path; a check of a large installation's
     * figures, which evaluates some hundred thousand candidates, no longer asks it each time.
     */
    private static final boolean UNITS_ALWAYS_CHECKED = Formula.class.desiredAssertionStatus();

    private static void requireUnits(String owner, String step, Step.Binding[] bindings) {
        for (Step.Binding b : bindings) {
            String expected = b.var().unit();
            String given = b.q().unit();
            // Units are mostly the same constant: compared by identity first (a call to equals per
            // binding of every candidate's formulas was a visible share under the first JIT tier).
            if (expected != given && !expected.equals(given)) {
                throw new IllegalStateException(owner + step + ": " + b.var().symbol() + " must be in '" + b.var().unit()
                        + "' but " + b.q().id() + " is in '" + b.q().unit() + "'");
            }
        }
    }
}
