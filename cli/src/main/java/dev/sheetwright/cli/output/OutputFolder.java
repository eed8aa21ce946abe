package dev.sheetwright.cli.output;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.FileVisitResult;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.SimpleFileVisitor;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.BasicFileAttributes;
import java.util.ArrayList;
import java.util.List;

/**
 * Writes a command's output without ever leaving it half written: everything goes into a staging folder beside
 * the target first; only when all files are complete are they moved into place. If anything fails, the staging
 * folder is removed and the target is untouched (not even created).
 */
public final class OutputFolder implements AutoCloseable {

    private final Path target;
    private final Path staging;
    private boolean committed;

    private OutputFolder(Path target, Path staging) {
        this.target = target;
        this.staging = staging;
    }

    public static OutputFolder stage(Path target) {
        Path abs = target.toAbsolutePath().normalize();
        if (Files.exists(abs) && !Files.isDirectory(abs)) {
            throw new IllegalArgumentException("output " + target + " exists and is not a folder");
        }
        try {
            Path parent = abs.getParent();
            Files.createDirectories(parent);
            Path staging = Files.createTempDirectory(parent, "." + abs.getFileName() + ".partial-");
            return new OutputFolder(abs, staging);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot create a staging folder beside " + target, e);
        }
    }

    /** Path of a file inside the staging folder (parent folders are created). */
    public Path file(String relative) {
        Path p = staging.resolve(relative).normalize();
        if (!p.startsWith(staging)) {
            throw new IllegalArgumentException("output file name leaves the output folder: " + relative);
        }
        try {
            Files.createDirectories(p.getParent());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return p;
    }

    /** Moves every staged file into the target folder, replacing files of the same name. */
    public void commit() {
        try {
            List<Path> files = new ArrayList<>();
            try (var walk = Files.walk(staging)) {
                walk.filter(Files::isRegularFile).forEach(files::add);
            }
            if (!Files.exists(target)) {
                try {
                    Files.move(staging, target, StandardCopyOption.ATOMIC_MOVE);
                    committed = true;
                    return;
                } catch (AtomicMoveNotSupportedException | java.nio.file.FileAlreadyExistsException e) {
                    // fall through to file-by-file moves
                }
            }
            for (Path f : files) {
                Path dest = target.resolve(staging.relativize(f).toString());
                Files.createDirectories(dest.getParent());
                Files.move(f, dest, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
            }
            committed = true;
            deleteTree(staging);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot move the output into " + target, e);
        }
    }

    @Override
    public void close() {
        if (!committed) {
            deleteTree(staging);
        }
    }

    private static void deleteTree(Path root) {
        if (!Files.exists(root)) {
            return;
        }
        try {
            Files.walkFileTree(root, new SimpleFileVisitor<>() {
                @Override
                public FileVisitResult visitFile(Path file, BasicFileAttributes attrs) throws IOException {
                    Files.delete(file);
                    return FileVisitResult.CONTINUE;
                }

                @Override
                public FileVisitResult postVisitDirectory(Path dir, IOException exc) throws IOException {
                    Files.delete(dir);
                    return FileVisitResult.CONTINUE;
                }
            });
        } catch (IOException e) {
            throw new UncheckedIOException("cannot remove the staging folder " + root, e);
        }
    }
}
