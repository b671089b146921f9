package coordination.plot.sheet;

import coordination.core.study.ReportWriter;
import coordination.core.study.Study;
import coordination.core.study.StudyReport;
import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Writes a study's sheets and report into a folder as one set: every file is rendered in memory,
 * written under a temporary name and flushed to disk; the files it replaces are moved aside; then
 * the new files are moved into place. If anything fails, the set is rolled back: the new files go
 * and the old ones come back, so the folder never holds a sheet and a report from two runs.
 */
public final class SheetWriter {
    /** Longest base name of an output: with the longest suffix, {@code .report.json}, 112 characters. */
    public static final int MAX_BASE = 100;
    /** Suffix of the report written beside each sheet. */
    public static final String REPORT_SUFFIX = ".report.json";

    private SheetWriter() {
    }

    /**
     * A base name safe to use for output files: letters, digits, dot, dash and underscore; anything
     * else, path separators included, becomes an underscore, a leading dot is replaced, and the
     * name is cut to {@link #MAX_BASE} characters. Extensions are added after, never cut.
     *
     * @param name a study name
     * @return the safe name, never empty
     */
    public static String safeName(String name) {
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < name.length() && b.length() < MAX_BASE; i++) {
            char c = name.charAt(i);
            boolean ok = c >= 'a' && c <= 'z' || c >= 'A' && c <= 'Z' || c >= '0' && c <= '9' || c == '-' || c == '_'
                    || c == '.';
            b.append(ok ? c : '_');
        }
        String s = b.toString();
        while (s.startsWith(".")) {
            s = "_" + s.substring(1);
        }
        return s.isEmpty() ? "study" : s;
    }

    /**
     * The names of the files {@link #render} writes for a study.
     *
     * @param studyName the study's name
     * @param formats the sheet formats
     * @return file names, no folder, in the order they are written
     */
    public static List<String> outputNames(String studyName, Set<OutputFormat> formats) {
        String base = safeName(studyName);
        List<String> names = new ArrayList<>();
        for (OutputFormat f : OutputFormat.values()) {
            if (formats.contains(f)) {
                names.add(base + "." + f.extension());
            }
        }
        names.add(base + REPORT_SUFFIX);
        return names;
    }

    /**
     * Renders the files of one study: {@code NAME.FORMAT} for each format and {@code NAME.report.json};
     * for a study with a network also {@code NAME.path-N.FORMAT}, a sheet per path from the source.
     *
     * @param study the study
     * @param report its report
     * @param formats the sheet formats
     * @param dpi PNG resolution
     * @return file names (no folder) and their bytes, in a fixed order
     * @throws IOException if rendering fails
     */
    public static Map<String, byte[]> render(Study study, StudyReport report, Set<OutputFormat> formats, int dpi)
            throws IOException {
        CoordinationSheet sheet = new CoordinationSheet(study, report);
        Map<String, byte[]> files = new LinkedHashMap<>();
        List<String> names = outputNames(study.name(), formats);
        int k = 0;
        for (OutputFormat f : OutputFormat.values()) {
            if (formats.contains(f)) {
                files.put(names.get(k++), sheet.render(f, dpi));
            }
        }
        files.put(names.get(k), ReportWriter.write(report).getBytes(StandardCharsets.UTF_8));
        // a network study also gets a sheet per path from the source to a load end
        for (Study path : coordination.core.study.StudyPaths.of(study)) {
            CoordinationSheet one = new CoordinationSheet(path, StudyReport.evaluate(path));
            for (OutputFormat f : OutputFormat.values()) {
                if (formats.contains(f)) {
                    files.put(safeName(path.name()) + "." + f.extension(), one.render(f, dpi));
                }
            }
        }
        return files;
    }

    /**
     * Writes rendered files into a folder as one set (see the class description).
     *
     * @param folder the output folder, created if missing
     * @param files names (plain file names, as {@link #outputNames} makes them) and bytes
     * @return the paths written
     * @throws IOException if a file cannot be written; the folder is then as it was
     */
    public static List<Path> write(Path folder, Map<String, byte[]> files) throws IOException {
        return write(folder, files, SheetWriter::move);
    }

    /** Moves a file; a seam for tests that make a move fail. */
    @FunctionalInterface
    interface Mover {
        void move(Path from, Path to) throws IOException;
    }

    static List<Path> write(Path folder, Map<String, byte[]> files, Mover mover) throws IOException {
        Files.createDirectories(folder);
        Path real = folder.toRealPath();
        List<Path> targets = new ArrayList<>();
        for (String name : files.keySet()) {
            Path target = real.resolve(name).normalize();
            if (!isSafeFileName(name) || !real.equals(target.getParent())) {
                throw new IOException("refusing to write outside " + real + ": " + name);
            }
            if (Files.isDirectory(target, LinkOption.NOFOLLOW_LINKS) || Files.isSymbolicLink(target)) {
                throw new IOException(target + " is a folder or a link - it is not replaced");
            }
            targets.add(target);
        }
        List<Path> temps = new ArrayList<>();
        List<Path[]> asides = new ArrayList<>();
        List<Path> placed = new ArrayList<>();
        boolean done = false;
        try {
            int i = 0;
            for (byte[] bytes : files.values()) {
                temps.add(writeTemporary(targets.get(i++), bytes));
            }
            for (Path target : targets) {
                if (Files.exists(target, LinkOption.NOFOLLOW_LINKS)) {
                    Path aside = Files.createTempFile(real, "." + target.getFileName() + ".", ".old");
                    try {
                        mover.move(target, aside);
                    } catch (IOException | RuntimeException e) {
                        Files.deleteIfExists(aside);
                        throw e;
                    }
                    asides.add(new Path[] {target, aside});
                }
            }
            for (int k = 0; k < targets.size(); k++) {
                mover.move(temps.get(k), targets.get(k));
                placed.add(targets.get(k));
            }
            syncFolder(real);
            done = true;
        } finally {
            if (!done) {
                rollBack(placed, asides);
            }
            for (Path t : temps) {
                Files.deleteIfExists(t);
            }
            if (done) {
                for (Path[] a : asides) {
                    Files.deleteIfExists(a[1]);
                }
            }
        }
        return targets;
    }

    private static boolean isSafeFileName(String name) {
        return !name.isEmpty() && !name.startsWith(".") && name.chars().allMatch(c -> c >= 'a' && c <= 'z'
                || c >= 'A' && c <= 'Z' || c >= '0' && c <= '9' || c == '-' || c == '_' || c == '.');
    }

    // the new files go, the old ones come back; a failure here leaves the .old files for the user
    private static void rollBack(List<Path> placed, List<Path[]> asides) {
        for (Path p : placed) {
            try {
                Files.deleteIfExists(p);
            } catch (IOException e) {
                // the restore below replaces it where it can
            }
        }
        for (Path[] a : asides) {
            try {
                move(a[1], a[0]);
            } catch (IOException e) {
                // nothing more can be done; the old file stays under its .old name
            }
        }
    }

    private static Path writeTemporary(Path target, byte[] bytes) throws IOException {
        Path tmp = Files.createTempFile(target.getParent(), "." + target.getFileName() + ".", ".tmp");
        try {
            try (FileChannel ch = FileChannel.open(tmp, StandardOpenOption.WRITE, StandardOpenOption.TRUNCATE_EXISTING)) {
                ByteBuffer buf = ByteBuffer.wrap(bytes);
                while (buf.hasRemaining()) {
                    ch.write(buf);
                }
                // on disk before the rename, so a power loss cannot leave an empty file under the final name
                ch.force(true);
            }
            try {
                // temporary files are private; a sheet is as readable as any file the user writes
                Files.setPosixFilePermissions(tmp, java.nio.file.attribute.PosixFilePermissions.fromString("rw-r--r--"));
            } catch (UnsupportedOperationException e) {
                // not a POSIX file system: the default permissions stand
            }
            return tmp;
        } catch (IOException | RuntimeException e) {
            Files.deleteIfExists(tmp);
            throw e;
        }
    }

    private static void syncFolder(Path folder) {
        try (FileChannel ch = FileChannel.open(folder, StandardOpenOption.READ)) {
            ch.force(true);
        } catch (IOException | UnsupportedOperationException e) {
            // some file systems cannot open a folder for syncing; the files themselves are synced
        }
    }

    private static void move(Path from, Path to) throws IOException {
        try {
            Files.move(from, to, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
        } catch (AtomicMoveNotSupportedException e) {
            Files.move(from, to, StandardCopyOption.REPLACE_EXISTING);
        }
    }

    /**
     * Writes one file under a temporary name beside it and moves it into place.
     *
     * @param target the file
     * @param bytes its content
     * @throws IOException if writing fails; the temporary file is removed
     */
    public static void writeAtomically(Path target, byte[] bytes) throws IOException {
        Path tmp = writeTemporary(target, bytes);
        try {
            move(tmp, target);
        } finally {
            Files.deleteIfExists(tmp);
        }
    }
}
