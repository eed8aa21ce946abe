package dev.sheetwright.dxf;

import java.text.Normalizer;
import java.util.Map;

/**
 * Makes any string safe as a DXF R12 TEXT value: only printable ASCII (space to {@code ~}) comes out, so no input
 * can start a new group-code line or leave the ANSI_1252 code page.
 *
 * <ul>
 *   <li>Letters with accents lose them ({@code é} → {@code e}, by Unicode compatibility decomposition), a few
 *       shop signs get ASCII words ({@code °} → {@code DEG}, {@code Ø} and {@code ⌀} → {@code DIA}, {@code ×} →
 *       {@code x}, {@code ±} → {@code +/-}, {@code ½} → {@code 1/2}), typographic dashes and quotes become plain
 *       ones, other spaces a plain space.</li>
 *   <li>Anything else, including control characters, tabs and line breaks, becomes {@code ?}.</li>
 *   <li>R12 reads {@code %%x} as a special character and {@code ^x} as a control character: every run of
 *       {@code %} is cut to one {@code %}, and {@code ^} is written {@code "^ "}, the DXF escape for a literal
 *       caret.</li>
 *   <li>The result is cut to {@value #MAX_LENGTH} characters, the longest string R12 readers take.</li>
 * </ul>
 */
final class AsciiLabels {

    static final int MAX_LENGTH = 255;

    private static final Map<Character, String> WORDS = Map.ofEntries(
            Map.entry('\u00B0', "DEG"), Map.entry('\u00D8', "DIA"), Map.entry('\u00F8', "DIA"),
            Map.entry('\u2300', "DIA"), Map.entry('\u00D7', "x"), Map.entry('\u00B1', "+/-"),
            Map.entry('\u00B5', "u"), Map.entry('\u03BC', "u"), Map.entry('\u00DF', "ss"),
            Map.entry('\u00C6', "AE"), Map.entry('\u00E6', "ae"), Map.entry('\u0152', "OE"),
            Map.entry('\u0153', "oe"), Map.entry('\u0141', "L"), Map.entry('\u0142', "l"),
            Map.entry('\u0110', "D"), Map.entry('\u0111', "d"), Map.entry('\u2044', "/"),
            Map.entry('\u2010', "-"), Map.entry('\u2011', "-"), Map.entry('\u2012', "-"),
            Map.entry('\u2013', "-"), Map.entry('\u2014', "-"), Map.entry('\u2212', "-"),
            Map.entry('\u2018', "'"), Map.entry('\u2019', "'"), Map.entry('\u201A', "'"),
            Map.entry('\u2032', "'"), Map.entry('\u201C', "\""), Map.entry('\u201D', "\""),
            Map.entry('\u201E', "\""), Map.entry('\u2033', "\""));

    private AsciiLabels() {
    }

    static String forDxf(String text) {
        StringBuilder plain = new StringBuilder(text.length());
        text.codePoints().forEach(cp -> plain.append(ascii(cp)));
        StringBuilder out = new StringBuilder(Math.min(plain.length(), MAX_LENGTH));
        for (int i = 0; i < plain.length(); i++) {
            char c = plain.charAt(i);
            if (c == '%' && out.length() > 0 && out.charAt(out.length() - 1) == '%') {
                continue;
            }
            String piece = c == '^' ? "^ " : String.valueOf(c);
            if (out.length() + piece.length() > MAX_LENGTH) {
                break;
            }
            out.append(piece);
        }
        return out.toString();
    }

    private static boolean printable(int c) {
        return c >= 0x20 && c <= 0x7E;
    }

    private static String ascii(int cp) {
        if (printable(cp)) {
            return String.valueOf((char) cp);
        }
        int type = Character.getType(cp);
        if (type == Character.SPACE_SEPARATOR) {
            return " ";
        }
        if (type == Character.CONTROL || type == Character.LINE_SEPARATOR || type == Character.PARAGRAPH_SEPARATOR
                || type == Character.SURROGATE || type == Character.FORMAT || type == Character.UNASSIGNED
                || type == Character.PRIVATE_USE) {
            return "?";
        }
        String decomposed = Normalizer.normalize(new String(Character.toChars(cp)), Normalizer.Form.NFKD);
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < decomposed.length(); i++) {
            char c = decomposed.charAt(i);
            int t = Character.getType(c);
            if (printable(c)) {
                sb.append(c);
            } else if (t == Character.NON_SPACING_MARK || t == Character.COMBINING_SPACING_MARK
                    || t == Character.ENCLOSING_MARK) {
                continue; // accent of a decomposed letter
            } else if (WORDS.containsKey(c)) {
                sb.append(WORDS.get(c));
            } else {
                return "?";
            }
        }
        return sb.length() == 0 ? "?" : sb.toString();
    }
}
