package org.feedernote.cli;

/** Exit statuses of every command, as the contract in input-format.md fixes them. */
public final class ExitStatus {
    private ExitStatus() {}

    public static final int PASS = 0;
    public static final int FAIL = 1;
    public static final int BAD_INPUT = 2;
    public static final int INTERNAL = 3;
}
