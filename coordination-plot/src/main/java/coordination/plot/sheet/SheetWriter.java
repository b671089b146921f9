package coordination.plot.sheet;

import coordination.core.study.ReportWriter;
import coordination.core.study.Study;
import coordination.core.study.StudyReport;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Writes a study's sheets and report into a folder. Every file is rendered in memory first, then
 * written under a temporary name in the same folder and moved into place, so a failure leaves the
 * folder as it was and no reader ever sees half a file.
 */
public final class SheetWriter {
    private SheetWriter() {
    }

    /**
     * A name safe to use as a file name: letters, digits, dot, dash and underscore; anything else,
     * including path separators, becomes an underscore, and a leading dot is replaced.
     *
     * @param name a study name
     * @return the safe name, never empty
     */
    public static String safeName(String name) {
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < name.length() && b.length() < 120; i++) {
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
     * Renders the files of one study: {@code NAME.FORMAT} for each format and {@code NAME.report.json}.
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
        String base = safeName(study.name());
        CoordinationSheet sheet = new CoordinationSheet(study, report);
        Map<String, byte[]> files = new LinkedHashMap<>();
        for (OutputFormat f : OutputFormat.values()) {
            if (formats.contains(f)) {
                files.put(base + "." + f.extension(), sheet.render(f, dpi));
            }
        }
        files.put(base + ".report.json", ReportWriter.write(report).getBytes(StandardCharsets.UTF_8));
        return files;
    }

    /**
     * Writes rendered files into a folder: every file is first written under a temporary name,
     * and only when all are written are they moved into place, so a failure (a full disk, a name
     * taken by a folder) leaves the folder's existing files as they were.
     *
     * @param folder the output folder, created if missing
     * @param files names and bytes
     * @return the paths written
     * @throws IOException if a file cannot be written; no temporary file is left behind
     */
    public static List<Path> write(Path folder, Map<String, byte[]> files) throws IOException {
        Files.createDirectories(folder);
        Path real = folder.toRealPath();
        List<Path> targets = new ArrayList<>();
        for (String name : files.keySet()) {
            Path target = real.resolve(safeName(name)).normalize();
            if (!real.equals(target.getParent())) {
                throw new IOException("refusing to write outside " + real + ": " + name);
            }
            if (Files.isDirectory(target, java.nio.file.LinkOption.NOFOLLOW_LINKS)
                    || Files.isSymbolicLink(target)) {
                throw new IOException(target + " is a folder or a link - it is not replaced");
            }
            targets.add(target);
        }
        List<Path> temps = new ArrayList<>();
        try {
            int i = 0;
            for (byte[] bytes : files.values()) {
                temps.add(writeTemporary(targets.get(i++), bytes));
            }
            for (int k = 0; k < targets.size(); k++) {
                move(temps.get(k), targets.get(k));
            }
        } finally {
            for (Path t : temps) {
                Files.deleteIfExists(t);
            }
        }
        return targets;
    }

    private static Path writeTemporary(Path target, byte[] bytes) throws IOException {
        Path tmp = Files.createTempFile(target.getParent(), "." + target.getFileName() + ".", ".tmp");
        try {
            Files.write(tmp, bytes);
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

    private static void move(Path tmp, Path target) throws IOException {
        try {
            Files.move(tmp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
        } catch (AtomicMoveNotSupportedException e) {
            Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING);
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
