package dev.sheetwright.dxf;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.util.ArrayList;
import java.util.List;

/** Test-side reader of DXF text as group-code/value pairs; it asserts the structure while it reads. */
final class GroupPairs {

    record Pair(int code, String value) {
    }

    private GroupPairs() {
    }

    /**
     * Splits {@code dxf} into pairs and asserts: every line ends with CRLF and holds no other CR or LF, the line
     * count is even, every code line is an integer (right-aligned in 3 columns), the last pair is {@code 0 EOF}.
     */
    static List<Pair> read(String dxf) {
        assertTrue(dxf.endsWith("\r\n"), "the file ends with CRLF");
        String[] lines = dxf.substring(0, dxf.length() - 2).split("\r\n", -1);
        for (int i = 0; i < lines.length; i++) {
            if (lines[i].indexOf('\r') >= 0 || lines[i].indexOf('\n') >= 0) {
                fail("line " + (i + 1) + " holds a CR or LF that is not part of a CRLF: " + lines[i]);
            }
        }
        assertEquals(0, lines.length % 2, "even number of lines (code/value pairs)");
        List<Pair> pairs = new ArrayList<>();
        for (int i = 0; i < lines.length; i += 2) {
            String code = lines[i];
            if (!code.matches(" *-?\\d{1,4}")) {
                fail("line " + (i + 1) + " is not an integer group code: \"" + code + "\"");
            }
            pairs.add(new Pair(Integer.parseInt(code.strip()), lines[i + 1]));
        }
        assertEquals(new Pair(0, "EOF"), pairs.get(pairs.size() - 1), "last pair");
        return pairs;
    }

    /** How many entities of {@code type} (pairs {@code 0 type}) there are. */
    static long count(List<Pair> pairs, String type) {
        return pairs.stream().filter(p -> p.code() == 0 && p.value().equals(type)).count();
    }

    /** Values of all pairs with this code, in order. */
    static List<String> values(List<Pair> pairs, int code) {
        return pairs.stream().filter(p -> p.code() == code).map(Pair::value).toList();
    }
}
