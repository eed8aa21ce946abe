package dev.sheetwright.dxf;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.channels.Channels;
import java.nio.channels.FileChannel;
import java.nio.charset.Charset;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.util.concurrent.ThreadLocalRandom;

/**
 * Writes a file so that readers see either the old file or the whole new one: the text goes to a hidden temporary
 * file in the target's directory ({@code .NAME.<random>.tmp}, created with the default permissions), is flushed to
 * the disk, then moved over the target with {@code ATOMIC_MOVE}, or with {@code REPLACE_EXISTING} where the file
 * system cannot move atomically. On any failure the temporary file is deleted and the target is left as it was.
 */
final class AtomicFiles {

    /** Writes the content; may throw {@link IOException} or {@link UncheckedIOException}. */
    @FunctionalInterface
    interface Content {
        void writeTo(Writer out) throws IOException;
    }

    private AtomicFiles() {
    }

    static void write(Path target, Charset charset, Content content) {
        Checks.notNull("target", target);
        Path file = target.toAbsolutePath().normalize();
        Path tmp = null;
        boolean moved = false;
        try {
            tmp = createTemporary(file);
            try (FileChannel channel = FileChannel.open(tmp, StandardOpenOption.WRITE);
                 Writer out = new BufferedWriter(Channels.newWriter(channel, charset.newEncoder(), -1))) {
                content.writeTo(out);
                out.flush();
                channel.force(true);
            }
            try {
                Files.move(tmp, file, StandardCopyOption.ATOMIC_MOVE);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(tmp, file, StandardCopyOption.REPLACE_EXISTING);
            }
            moved = true;
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write " + file + ": " + e, e);
        } finally {
            if (tmp != null && !moved) {
                try {
                    Files.deleteIfExists(tmp);
                } catch (IOException ignored) {
                    // the original failure is the one to report
                }
            }
        }
    }

    private static Path createTemporary(Path file) throws IOException {
        Path dir = file.getParent();
        for (int attempt = 0; ; attempt++) {
            String name = "." + file.getFileName() + "." + Long.toHexString(ThreadLocalRandom.current().nextLong())
                    + ".tmp";
            try {
                return Files.createFile(dir.resolve(name));
            } catch (FileAlreadyExistsException e) {
                if (attempt == 9) {
                    throw e;
                }
            }
        }
    }
}
