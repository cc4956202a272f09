package org.thermion.lang;

/** One message about the user's input: where, how bad, what is wrong and what to do. */
public record Diagnostic(Severity severity, Span span, String message, String hint) {

    /** How serious a diagnostic is; errors stop the pipeline, warnings do not. */
    public enum Severity { ERROR, WARNING, NOTE }

    public static Diagnostic error(Span span, String message, String hint) {
        return new Diagnostic(Severity.ERROR, span, message, hint);
    }

    public static Diagnostic warning(Span span, String message, String hint) {
        return new Diagnostic(Severity.WARNING, span, message, hint);
    }

    public boolean isError() {
        return severity == Severity.ERROR;
    }
}
