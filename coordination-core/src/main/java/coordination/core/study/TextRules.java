package coordination.core.study;

import java.util.Optional;

/**
 * The characters a study file's text may hold. Control characters, unpaired surrogates, bidi
 * controls and non-characters are refused: they make SVG malformed, drive a terminal, reverse
 * drawn text or forge a second error line when echoed. {@link #printable} escapes them wherever
 * text from the user is echoed anyway.
 */
public final class TextRules {
    private TextRules() {
    }

    /**
     * Whether a character may stand in a text value or key.
     *
     * @param c a UTF-16 unit, surrogates excluded (they are judged in pairs)
     * @return false for a refused character
     */
    static boolean allowed(char c) {
        if (Character.getType(c) == Character.CONTROL) {
            return false;
        }
        return !(c == '\u061C' || c == '\u200E' || c == '\u200F' || c >= '\u202A' && c <= '\u202E'
                || c >= '\u2066' && c <= '\u2069' || c == '\u2028' || c == '\u2029' || c == '\uFFFE' || c == '\uFFFF'
                || c >= '\uFDD0' && c <= '\uFDEF');
    }

    /**
     * The first refused character of a text, as a message.
     *
     * @param text the text
     * @param whitespaceAllowed whether tab, line feed and carriage return are allowed (raw file text)
     * @return the index of the character and the message, or empty if every character is allowed
     */
    static Optional<Refusal> check(String text, boolean whitespaceAllowed) {
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (Character.isHighSurrogate(c) && i + 1 < text.length() && Character.isLowSurrogate(text.charAt(i + 1))) {
                i++;
                continue;
            }
            if (whitespaceAllowed && (c == '\t' || c == '\n' || c == '\r')) {
                continue;
            }
            if (Character.isSurrogate(c)) {
                return Optional.of(new Refusal(i, "holds an unpaired surrogate " + code(c)
                        + " - a study file holds whole characters only"));
            }
            if (!allowed(c)) {
                return Optional.of(new Refusal(i, "holds the " + (Character.getType(c) == Character.CONTROL
                        ? "control" : "invisible formatting") + " character " + code(c)
                        + " - text in a study file is printable characters only"));
            }
        }
        return Optional.empty();
    }

    /**
     * A refused character.
     *
     * @param index its index in the text
     * @param message what is wrong
     */
    record Refusal(int index, String message) {
    }

    /**
     * Text as it may be echoed to a terminal or a file: every refused character written as
     * {@code \}{@code uXXXX}, so nothing the user wrote can end a line or drive the terminal.
     *
     * @param text any text, or null
     * @return the escaped text ({@code "null"} for null)
     */
    public static String printable(String text) {
        if (text == null) {
            return "null";
        }
        StringBuilder b = null;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            boolean pair = Character.isHighSurrogate(c) && i + 1 < text.length()
                    && Character.isLowSurrogate(text.charAt(i + 1));
            boolean bad = !pair && (Character.isSurrogate(c) || !allowed(c));
            if (bad && b == null) {
                b = new StringBuilder(text.length() + 8).append(text, 0, i);
            }
            if (b != null) {
                if (bad) {
                    b.append(code(c).replace("U+", "\\u"));
                } else {
                    b.append(c);
                    if (pair) {
                        b.append(text.charAt(++i));
                    }
                }
            } else if (pair) {
                i++;
            }
        }
        return b == null ? text : b.toString();
    }

    private static String code(char c) {
        return String.format(java.util.Locale.ROOT, "U+%04X", (int) c);
    }
}
