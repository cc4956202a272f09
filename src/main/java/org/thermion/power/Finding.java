package org.thermion.power;

/**
 * One thing the budget found: a problem ({@link Severity#ERROR}, the check fails), a
 * warning, or a note. {@code subject} names what it is about (a rail, a heater string),
 * {@code advice} says what to do, or is null.
 */
public record Finding(Severity severity, String subject, String message, String advice) {

    /** How serious a finding is. */
    public enum Severity { ERROR, WARNING, NOTE }

    public boolean isError() {
        return severity == Severity.ERROR;
    }
}
