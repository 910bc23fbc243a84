package io.github.eigengate.arith;

/**
 * Thrown when a textual rational number or polynomial cannot be parsed.
 *
 * <p>Carries the 0-based character offset into the parsed text where the problem was found and a
 * plain-words description of what was expected there, so that a caller can point a user to the
 * exact column of a table cell.
 */
public final class ExpressionSyntaxException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    private final String text;
    private final int offset;
    private final String expected;

    /**
     * @param text the full text being parsed
     * @param offset 0-based index into {@code text} of the offending character ({@code text.length()}
     *     for "unexpected end")
     * @param expected what was expected at that position, in plain words
     */
    public ExpressionSyntaxException(String text, int offset, String expected) {
        super(message(text, offset, expected));
        this.text = text;
        this.offset = offset;
        this.expected = expected;
    }

    private static String message(String text, int offset, String expected) {
        String found = offset >= text.length() ? "end of text" : "'" + text.charAt(offset) + "'";
        return "expected " + expected + " at offset " + offset + " in \"" + text + "\" but found " + found;
    }

    /** @return the 0-based character index into the parsed text where the problem is */
    public int offset() {
        return offset;
    }

    /** @return what was expected at {@link #offset()}, in plain words */
    public String expected() {
        return expected;
    }

    /** @return the text that was being parsed */
    public String text() {
        return text;
    }
}
