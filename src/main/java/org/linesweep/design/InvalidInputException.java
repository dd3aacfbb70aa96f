package org.linesweep.design;

/**
 * Input that breaks a rule. The message names the field, the value given and what is allowed, in one line.
 */
public final class InvalidInputException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    private final String field;
    private final String value;
    private final String allowed;

    public InvalidInputException(String field, String value, String allowed) {
        super(field + ": " + (value == null ? "(missing)" : "'" + value + "'") + ": " + allowed);
        this.field = field;
        this.value = value;
        this.allowed = allowed;
    }

    /** The field's path in a design file, e.g. {@code line.innerDiameter}. */
    public String field() {
        return field;
    }

    /** The value as given, or null when it was missing. */
    public String value() {
        return value;
    }

    /** What is allowed, in words. */
    public String allowed() {
        return allowed;
    }
}
