package dev.sheetwright.cli.job;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CoderResult;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import org.snakeyaml.engine.v2.api.Load;
import org.snakeyaml.engine.v2.api.LoadSettings;
import org.snakeyaml.engine.v2.api.lowlevel.Parse;
import org.snakeyaml.engine.v2.events.Event;
import org.snakeyaml.engine.v2.exceptions.YamlEngineException;

/**
 * Loads one YAML file (a job or shop file) into plain maps, lists, strings, numbers and booleans, refusing what is
 * not a sane settings file: bytes that are not UTF-8 text (with the byte offset), nesting deeper than
 * {@link #MAX_DEPTH}, more than a few aliases, duplicate keys. Every refusal is a {@link JobFileException} naming the
 * file.
 */
final class YamlDocument {

    /** Deepest nesting of mappings and lists; job files need about five (common practice: generous headroom). */
    static final int MAX_DEPTH = 50;

    private YamlDocument() {
    }

    /** Reads and loads {@code path}; {@code kind} names the file for messages ("job file", "shop file"). */
    static Object read(Path path, String kind) {
        byte[] bytes;
        try {
            bytes = Files.readAllBytes(path);
        } catch (IOException e) {
            throw new JobFileException(path.toString(), null, null, "cannot read the " + kind + ": " + e.getMessage());
        }
        return load(text(bytes, path.toString(), kind), path.toString());
    }

    /** The bytes as UTF-8 text, or a refusal giving the byte offset of the first byte that is not text. */
    static String text(byte[] bytes, String file, String kind) {
        CharsetDecoder decoder = StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT);
        ByteBuffer in = ByteBuffer.wrap(bytes);
        CharBuffer out = CharBuffer.allocate(bytes.length + 1);
        CoderResult r = decoder.decode(in, out, true);
        if (r.isError()) {
            throw notText(bytes, in.position(), file, kind);
        }
        decoder.flush(out);
        for (int i = 0; i < bytes.length; i++) {
            if (bytes[i] == 0) {
                throw notText(bytes, i, file, kind);
            }
        }
        out.flip();
        return out.toString();
    }

    private static JobFileException notText(byte[] bytes, int offset, String file, String kind) {
        int line = 1;
        for (int i = 0; i < offset; i++) {
            if (bytes[i] == '\n') {
                line++;
            }
        }
        return new JobFileException(file, null, null, "the " + kind + " is not UTF-8 text: byte "
                + String.format(Locale.ROOT, "0x%02X", bytes[offset] & 0xff) + " at byte offset " + offset
                + " (line " + line + ") is not valid UTF-8 text; save the file as UTF-8 (a binary file cannot be"
                + " read)");
    }

    /** Loads YAML text: depth checked on the event stream first, so deep input never reaches the composer. */
    static Object load(String text, String file) {
        LoadSettings settings = LoadSettings.builder().setLabel(file).setAllowDuplicateKeys(false)
                .setMaxAliasesForCollections(10).build();
        try {
            int depth = 0;
            for (Event e : new Parse(settings).parseString(text)) {
                switch (e.getEventId()) {
                    case MappingStart, SequenceStart -> {
                        if (++depth > MAX_DEPTH) {
                            throw new JobFileException(file, null, null, "nested more than " + MAX_DEPTH
                                    + " levels deep" + e.getStartMark().map(m -> " at line " + (m.getLine() + 1))
                                    .orElse("") + "; a job or shop file needs only a few levels");
                        }
                    }
                    case MappingEnd, SequenceEnd -> depth--;
                    default -> {
                    }
                }
            }
            return new Load(settings).loadFromString(text);
        } catch (YamlEngineException e) {
            throw new JobFileException(file, null, null, "not valid YAML: " + e.getMessage().replace('\n', ' '));
        }
    }
}
