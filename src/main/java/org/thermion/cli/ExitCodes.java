package org.thermion.cli;

/** Exit codes shared by every command. */
public final class ExitCodes {
    public static final int OK = 0;
    public static final int CHECK_FAILED = 1;
    public static final int BAD_INPUT = 2;
    public static final int INTERNAL = 3;

    private ExitCodes() {
    }
}
