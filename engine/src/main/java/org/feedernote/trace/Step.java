package org.feedernote.trace;

import java.util.List;

import org.feedernote.expr.Expr;
import org.feedernote.expr.Var;

/** One step of the worked calculation. */
public sealed interface Step {

    String id();
    String title();
    /** Standard, edition, clause or table the step rests on; empty where none applies. */
    String reference();
    /** Ids of the steps whose values this step used. */
    List<String> uses();
    String kind();

    /** Whether an input value was given or defaulted. */
    enum Origin { GIVEN, DEFAULT, DERIVED }

    /**
     * A value from the design input, or the stated default where the input was silent. The id
     * (in the result) and the key path are each kept as the owner's part and the step's, joined
     * where they are read.
     */
    record Input(Q result, String title, String keyPathOwner, String keyPathStep, Origin origin, String reference)
            implements Step {
        public Input(String id, String title, String symbol, double value, String unit, String keyPath, Origin origin,
                     String reference) {
            this(new Q(id, symbol, value, unit), title, keyPath, "", origin, reference);
        }

        public String id() { return result.id(); }
        public String symbol() { return result.symbol(); }
        public double value() { return result.value(); }
        public String unit() { return result.unit(); }
        /** Where in the design input the value was given (or would have been), or "" for a derived value. */
        public String keyPath() { return keyPathStep.isEmpty() ? keyPathOwner : keyPathOwner + keyPathStep; }
        public List<String> uses() { return List.of(); }
        public String kind() { return "input"; }
        public Q q() { return result; }
    }

    /** A tabulated value, with the table, the row and column used, and the lookup method. */
    record Lookup(Q result, String title, TableRef table, String row, String column, String method, List<String> uses)
            implements Step {
        public Lookup(String id, String title, String symbol, double value, String unit, TableRef table, String row,
                      String column, String method, List<String> uses) {
            this(new Q(id, symbol, value, unit), title, table, row, column, method, uses);
        }

        public String id() { return result.id(); }
        public String symbol() { return result.symbol(); }
        public double value() { return result.value(); }
        public String unit() { return result.unit(); }
        public String reference() { return table.citation(); }
        public String kind() { return "lookup"; }
        public Q q() { return result; }
    }

    /** A correction or derating factor applied by a rule. */
    record Factor(String id, String title, String symbol, double value, String reason, String reference,
                  List<String> uses) implements Step {
        public String kind() { return "factor"; }
        public Q q() { return new Q(id, symbol, value, ""); }
    }

    /** One variable of a formula bound to the quantity that supplied it. */
    record Binding(Var var, Q q) {}

    /**
     * A formula evaluated: the expression itself, its bindings and its result. The result keeps
     * the step's id as the owner's and the step's own part, joined when first read.
     */
    record Formula(Q result, String title, String formulaId, Expr expr, List<Binding> bindings, String form,
                   String reference) implements Step {
        public String id() { return result.id(); }
        public String symbol() { return result.symbol(); }
        public String unit() { return result.unit(); }
        public double value() { return result.value(); }
        public List<String> uses() {
            return bindings.stream().map(b -> b.q().id()).distinct().toList();
        }
        public String kind() { return "formula"; }
        public Q q() { return result; }
    }

    /** A comparison of a value against its limit with the outcome; it uses the steps of the two. */
    record Check(String id, String title, String name, Q value, String comparison, Q limit, boolean pass,
                 String reference) implements Step {
        public List<String> uses() { return List.of(value.id(), limit.id()); }
        public String kind() { return "check"; }
    }

    /** Which branch was taken and why. */
    record Decision(String id, String title, String because, String outcome, String reference,
                    List<String> uses) implements Step {
        public String kind() { return "decision"; }
    }

    /** A remark the reader needs (an assumption, an override, a limitation). */
    record Note(String id, String title, String text, String reference) implements Step {
        public List<String> uses() { return List.of(); }
        public String kind() { return "note"; }
    }
}
