package org.feedernote.input;

import java.util.List;

/** The design input is wrong; carries every error found, in file order. */
public final class InputException extends Exception {
    private final List<InputError> errors;

    public InputException(List<InputError> errors) {
        super(errors.size() + " error(s) in the design input");
        this.errors = List.copyOf(errors);
    }

    public List<InputError> errors() { return errors; }
}
