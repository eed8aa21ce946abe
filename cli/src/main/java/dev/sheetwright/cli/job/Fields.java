package dev.sheetwright.cli.job;

import dev.sheetwright.core.units.Lengths;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;

/**
 * One mapping of the job file with typed reads; every error names the file, the fitting (if any) and the full
 * field path.
 */
final class Fields {

    private final String file;
    private final String fitting;
    private final String prefix;
    private final Map<String, Object> map;
    /** Largest magnitude a number may have here (a length bound), and how to say it. */
    private final double largest;
    private final String largestText;

    private Fields(String file, String fitting, String prefix, Map<String, Object> map) {
        this(file, fitting, prefix, map, Double.POSITIVE_INFINITY, "");
    }

    private Fields(String file, String fitting, String prefix, Map<String, Object> map, double largest,
            String largestText) {
        this.file = file;
        this.fitting = fitting;
        this.prefix = prefix;
        this.map = map;
        this.largest = largest;
        this.largestText = largestText;
    }

    /**
     * The same fields where every number is a length (or an angle) no larger than {@code largest}; nested
     * mappings keep the bound. {@code text} says the bound for messages, e.g. {@code 1000 in}.
     */
    Fields withLargest(double largest, String text) {
        return new Fields(file, fitting, prefix, map, largest, text);
    }

    static Fields root(String file, Object document) {
        if (!(document instanceof Map<?, ?>)) {
            throw new JobFileException(file, null, null, "the job file must be a YAML mapping (key: value lines)");
        }
        return new Fields(file, null, "", asStringMap(file, null, "", document));
    }

    private static Map<String, Object> asStringMap(String file, String fitting, String path, Object o) {
        Map<String, Object> m = new LinkedHashMap<>();
        for (Map.Entry<?, ?> e : ((Map<?, ?>) o).entrySet()) {
            if (!(e.getKey() instanceof String)) {
                throw new JobFileException(file, fitting, path.isEmpty() ? String.valueOf(e.getKey()) : path,
                        "keys must be words, got " + e.getKey());
            }
            m.put((String) e.getKey(), e.getValue());
        }
        return m;
    }

    String file() {
        return file;
    }

    String fitting() {
        return fitting;
    }

    /** The same fields, now known to belong to a fitting: messages name the fitting and the field within it. */
    Fields forFitting(String id) {
        return new Fields(file, id, "", map, largest, largestText);
    }

    String path(String key) {
        return prefix + key;
    }

    JobFileException error(String key, String message) {
        return new JobFileException(file, fitting, key == null ? null : path(key), message);
    }

    boolean has(String key) {
        return map.containsKey(key) && map.get(key) != null;
    }

    Object raw(String key) {
        return map.get(key);
    }

    /** Refuses keys this mapping does not know, so a typo never silently falls back to a default. */
    void allowOnly(Set<String> allowed) {
        for (String k : map.keySet()) {
            if (!allowed.contains(k)) {
                throw error(k, "unknown field; expected one of " + new TreeSet<>(allowed));
            }
        }
    }

    Fields map(String key) {
        Object o = map.get(key);
        if (!(o instanceof Map<?, ?>)) {
            throw error(key, "must be a mapping (indented key: value lines)");
        }
        return new Fields(file, fitting, path(key) + ".", asStringMap(file, fitting, path(key), o), largest,
                largestText);
    }

    List<Fields> listOfMaps(String key) {
        Object o = map.get(key);
        if (!(o instanceof List<?> list)) {
            throw error(key, "must be a list (lines starting with '- ')");
        }
        List<Fields> out = new ArrayList<>();
        for (int i = 0; i < list.size(); i++) {
            Object item = list.get(i);
            String p = path(key) + "[" + (i + 1) + "]";
            if (!(item instanceof Map<?, ?>)) {
                throw new JobFileException(file, fitting, p, "must be a mapping (key: value lines)");
            }
            out.add(new Fields(file, fitting, p + ".", asStringMap(file, fitting, p, item), largest, largestText));
        }
        return out;
    }

    String string(String key) {
        Object o = map.get(key);
        if (o == null) {
            throw error(key, "is required");
        }
        if (o instanceof Map<?, ?> || o instanceof List<?>) {
            throw error(key, "must be a single value");
        }
        String s = String.valueOf(o).trim();
        if (s.isEmpty()) {
            throw error(key, "must not be empty");
        }
        return s;
    }

    String string(String key, String dflt) {
        return has(key) ? string(key) : dflt;
    }

    /** A length or other number: a YAML number, or text such as {@code 18 7/8}, {@code 3/8}, {@code 12-1/2}. */
    double number(String key) {
        Object o = map.get(key);
        if (o == null) {
            throw error(key, "is required");
        }
        double v;
        if (o instanceof Number n) {
            v = n.doubleValue();
        } else if (o instanceof String s) {
            try {
                v = Lengths.parse(s);
            } catch (IllegalArgumentException e) {
                throw error(key, e.getMessage());
            }
        } else {
            throw error(key, "must be a number, got " + o);
        }
        if (!Double.isFinite(v)) {
            throw error(key, "must be a finite number, got " + o);
        }
        if (Math.abs(v) > largest) {
            throw error(key, "must be at most " + largestText + ", got " + o);
        }
        return v;
    }

    double number(String key, double dflt) {
        return has(key) ? number(key) : dflt;
    }

    double positive(String key) {
        double v = number(key);
        if (!(v > 0)) {
            throw error(key, "must be greater than zero, got " + format(v));
        }
        return v;
    }

    double notNegative(String key, double dflt) {
        double v = number(key, dflt);
        if (v < 0) {
            throw error(key, "must not be negative, got " + format(v));
        }
        return v;
    }

    int integer(String key, int dflt, int min, int max) {
        if (!has(key)) {
            return dflt;
        }
        Object o = map.get(key);
        if (!(o instanceof Integer || o instanceof Long)) {
            throw error(key, "must be a whole number from " + min + " to " + max + ", got " + o);
        }
        long v = ((Number) o).longValue();
        if (v < min || v > max) {
            throw error(key, "must be a whole number from " + min + " to " + max + ", got " + v);
        }
        return (int) v;
    }

    boolean bool(String key, boolean dflt) {
        if (!has(key)) {
            return dflt;
        }
        Object o = map.get(key);
        if (!(o instanceof Boolean b)) {
            throw error(key, "must be true or false, got " + o);
        }
        return b;
    }

    private static String format(double v) {
        return v == Math.rint(v) ? String.valueOf((long) v) : String.valueOf(v);
    }
}
