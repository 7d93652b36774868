package org.feedernote.expr;

/** A formula could not be evaluated: an unbound symbol, a division by zero, a non-finite result. */
public final class EvaluationException extends RuntimeException {
    private final String stepId;

    public EvaluationException(String stepId, String message) {
        super(stepId + ": " + message);
        this.stepId = stepId;
    }

    public String stepId() { return stepId; }
}
