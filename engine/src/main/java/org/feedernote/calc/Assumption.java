package org.feedernote.calc;

/**
 * A figure a check or the whole calculation rests on that is not data: a default standing in for a
 * missing datum, or a conservative bound (an operating time taken as an upper bound). key is the
 * input key whose value would replace it; safeSide is true where the assumption can only make the
 * verdict stricter (a failure may then be removed by the datum, a pass cannot be).
 */
public record Assumption(String what, String key, boolean safeSide) {

    /** The line the terminal and the note show. */
    public String text() {
        return what + " (" + key + " would replace it)";
    }
}
