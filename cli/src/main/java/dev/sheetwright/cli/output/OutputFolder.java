package dev.sheetwright.cli.output;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.FileVisitResult;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.nio.file.SimpleFileVisitor;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.BasicFileAttributes;
import java.nio.file.attribute.FileTime;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Set;

/**
 * Writes a command's output folder whole, never half written and never mixed with an earlier run's files.
 *
 * <p>Everything goes into a hidden staging folder beside the target ({@code .OUT.partial-...}). On
 * {@link #commit()} the staging folder takes the target's place by rename: an existing target is first renamed
 * aside ({@code .OUT.old-...}), the staging folder is renamed to the target, and only then is the old folder
 * removed. If the second rename fails, the old folder is renamed back, so the target is either the whole old
 * output or the whole new one. If anything fails before the commit, the staging folder is removed and the target is
 * untouched (not even created).
 *
 * <p>Only a folder sheetwright wrote (it holds {@link #MARKER}, or an earlier run's {@code nest.json},
 * {@code patterns.json} or {@code quote.json}) or an empty folder is replaced; any other folder is refused, so a
 * mistyped {@code -o} never wipes someone's files. Staging and set-aside folders carry the process id and start
 * time in their names; those of a process that no longer runs (a killed run) are removed by the next run.
 */
public final class OutputFolder implements AutoCloseable {

    /** The file that marks a folder as sheetwright output (it lists what wrote it). */
    public static final String MARKER = ".sheetwright-output";

    private static final Set<String> EARLIER_OUTPUT = Set.of("nest.json", "patterns.json", "quote.json", MARKER);
    /** A staging folder whose name carries no owner is left alone this long (common practice). */
    private static final Duration UNOWNED_GRACE = Duration.ofMinutes(1);

    /** Renames one folder; a test may put a failing one in its place. */
    interface Mover {
        void move(Path from, Path to) throws IOException;
    }

    private static final Mover RENAME = (from, to) -> Files.move(from, to, StandardCopyOption.ATOMIC_MOVE);

    private final Path target;
    private final Path staging;
    private final Mover mover;
    private boolean committed;

    private OutputFolder(Path target, Path staging, Mover mover) {
        this.target = target;
        this.staging = staging;
        this.mover = mover;
    }

    /**
     * Checks, before any long work, that {@code target} can be written and replaced: it is a folder or does not
     * exist, it is sheetwright output or empty, it does not hold the current folder, and a staging folder can be
     * made beside it. Also removes staging folders left by killed runs. Throws {@link IllegalArgumentException}
     * (bad input) naming the folder and the reason; writes nothing that stays.
     */
    public static void check(Path target) {
        Path abs = resolve(target);
        Path parent = abs.getParent();
        Path existing = parent;
        while (existing != null && !Files.exists(existing)) {
            existing = existing.getParent();
        }
        if (existing == null || !Files.isDirectory(existing)) {
            throw new IllegalArgumentException("output " + target + ": cannot be made, "
                    + (existing == null ? "no folder above it exists" : existing + " is not a folder"));
        }
        if (existing.equals(parent)) {
            removeStale(abs);
            try {
                Path probe = Files.createTempDirectory(parent, stagingPrefix(abs));
                Files.delete(probe);
            } catch (IOException e) {
                throw new IllegalArgumentException("output " + target + ": cannot write in " + parent + " ("
                        + describe(e) + ")");
            }
        } else if (!Files.isWritable(existing)) {
            throw new IllegalArgumentException("output " + target + ": cannot write in " + existing);
        }
    }

    /** Checks the target ({@link #check}) and opens a new staging folder beside it. */
    public static OutputFolder stage(Path target) {
        return stage(target, RENAME);
    }

    static OutputFolder stage(Path target, Mover mover) {
        check(target);
        Path abs = resolve(target);
        try {
            Path parent = abs.getParent();
            Files.createDirectories(parent);
            Path staging = Files.createTempDirectory(parent, stagingPrefix(abs));
            return new OutputFolder(abs, staging, mover);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot create a staging folder beside " + target, e);
        }
    }

    /** Path of a file inside the staging folder (parent folders are created). */
    public Path file(String relative) {
        Path p = staging.resolve(relative).normalize();
        if (!p.startsWith(staging) || p.equals(staging)) {
            throw new IllegalArgumentException("output file name leaves the output folder: " + relative);
        }
        try {
            Files.createDirectories(p.getParent());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return p;
    }

    /**
     * Puts the staged folder in the target's place: afterwards the target holds exactly the files of this run.
     * On failure the target is as it was before and the exception says why.
     */
    public void commit() {
        if (committed) {
            throw new IllegalStateException("output " + target + " was already committed");
        }
        try {
            Files.writeString(staging.resolve(MARKER), "written by sheetwright; the whole folder is replaced by the"
                    + " next run that writes here\n");
            if (!Files.exists(target, LinkOption.NOFOLLOW_LINKS)) {
                mover.move(staging, target);
                committed = true;
                return;
            }
            refuseForeign(target, target.toString());
            Path old = Files.createTempDirectory(target.getParent(), oldPrefix(target));
            Files.delete(old);
            mover.move(target, old);
            try {
                mover.move(staging, target);
            } catch (IOException e) {
                try {
                    mover.move(old, target);
                } catch (IOException back) {
                    e.addSuppressed(back);
                    throw new UncheckedIOException("cannot put the new output in place of " + target
                            + "; the earlier output is kept in " + old, e);
                }
                throw e;
            }
            committed = true;
            deleteQuietly(old);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot put the output in place of " + target + " (" + describe(e)
                    + "); it is unchanged", e);
        }
    }

    @Override
    public void close() {
        if (!committed) {
            deleteQuietly(staging);
        }
    }

    private static Path resolve(Path target) {
        Path abs = target.toAbsolutePath().normalize();
        if (Files.isSymbolicLink(abs)) {
            try {
                abs = abs.toRealPath();
            } catch (IOException e) {
                throw new IllegalArgumentException("output " + target + ": the link leads nowhere (" + describe(e)
                        + ")");
            }
        }
        if (abs.getParent() == null) {
            throw new IllegalArgumentException("output " + target + ": the top folder of a disk cannot be an output"
                    + " folder");
        }
        if (Files.exists(abs) && !Files.isDirectory(abs)) {
            throw new IllegalArgumentException("output " + target + " exists and is not a folder");
        }
        Path here = Path.of("").toAbsolutePath().normalize();
        if (here.startsWith(abs)) {
            throw new IllegalArgumentException("output " + target + " holds the current folder; the output folder is"
                    + " replaced whole, so give a folder inside it (for example -o out)");
        }
        if (Files.isDirectory(abs)) {
            refuseForeign(abs, target.toString());
        }
        return abs;
    }

    /** Refuses to replace a folder that holds files but is not sheetwright output. */
    private static void refuseForeign(Path abs, String label) {
        try (var entries = Files.list(abs)) {
            List<String> names = entries.map(p -> p.getFileName().toString()).toList();
            if (!names.isEmpty() && names.stream().noneMatch(EARLIER_OUTPUT::contains)) {
                throw new IllegalArgumentException("output " + label + " holds files sheetwright did not write (for"
                        + " example " + names.get(0) + "); the output folder is replaced whole, so give a new or"
                        + " empty folder");
            }
        } catch (IOException e) {
            throw new IllegalArgumentException("output " + label + ": cannot read the folder (" + describe(e) + ")");
        }
    }

    private static String owner() {
        ProcessHandle self = ProcessHandle.current();
        long start = self.info().startInstant().map(Instant::toEpochMilli).orElse(0L);
        return self.pid() + "-" + start + "-";
    }

    private static String stagingPrefix(Path abs) {
        return "." + abs.getFileName() + ".partial-" + owner();
    }

    private static String oldPrefix(Path abs) {
        return "." + abs.getFileName() + ".old-" + owner();
    }

    /**
     * Removes {@code .OUT.partial-*} and {@code .OUT.old-*} folders beside the target whose process has ended.
     * A folder without an owner in its name (an older version's) is removed once it is a minute old.
     */
    static void removeStale(Path abs) {
        String name = abs.getFileName().toString();
        List<String> prefixes = List.of("." + name + ".partial-", "." + name + ".old-");
        List<Path> stale = new ArrayList<>();
        try (var siblings = Files.list(abs.getParent())) {
            siblings.filter(p -> Files.isDirectory(p, LinkOption.NOFOLLOW_LINKS)).forEach(p -> {
                String n = p.getFileName().toString();
                for (String prefix : prefixes) {
                    if (n.startsWith(prefix) && isStale(p, n.substring(prefix.length()))) {
                        stale.add(p);
                    }
                }
            });
        } catch (IOException e) {
            return; // the writability probe that follows reports a folder we cannot read
        }
        stale.forEach(OutputFolder::deleteQuietly);
    }

    private static boolean isStale(Path folder, String suffix) {
        String[] parts = suffix.split("-");
        if (parts.length >= 3) {
            try {
                long pid = Long.parseLong(parts[0]);
                long start = Long.parseLong(parts[1]);
                Optional<ProcessHandle> p = ProcessHandle.of(pid);
                if (p.isEmpty() || !p.get().isAlive()) {
                    return true;
                }
                long actual = p.get().info().startInstant().map(Instant::toEpochMilli).orElse(start);
                return actual != start; // the process id was reused by a later process
            } catch (NumberFormatException e) {
                // fall through: not a name this version writes
            }
        }
        try {
            FileTime modified = Files.getLastModifiedTime(folder, LinkOption.NOFOLLOW_LINKS);
            return modified.toInstant().isBefore(Instant.now().minus(UNOWNED_GRACE));
        } catch (IOException e) {
            return false;
        }
    }

    private static String describe(IOException e) {
        return e.getClass().getSimpleName().replace("Exception", "").replaceAll("([a-z])([A-Z])", "$1 $2")
                .toLowerCase(java.util.Locale.ROOT) + (e.getMessage() == null ? "" : ": " + e.getMessage());
    }

    /** Removes a folder tree, making folders writable first so a read-only sub-folder does not stop it. */
    private static void deleteQuietly(Path root) {
        if (!Files.exists(root, LinkOption.NOFOLLOW_LINKS)) {
            return;
        }
        try {
            Files.walkFileTree(root, new SimpleFileVisitor<>() {
                @Override
                public FileVisitResult preVisitDirectory(Path dir, BasicFileAttributes attrs) {
                    dir.toFile().setWritable(true, true);
                    return FileVisitResult.CONTINUE;
                }

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
            // a leftover hidden folder is removed by the next run (removeStale)
        }
    }
}
