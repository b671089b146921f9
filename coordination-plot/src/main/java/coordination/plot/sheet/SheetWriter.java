package coordination.plot.sheet;

import coordination.core.study.ReportJson;
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
        files.put(base + ".report.json", ReportJson.write(report).getBytes(StandardCharsets.UTF_8));
        return files;
    }

    /**
     * Writes rendered files into a folder, each atomically.
     *
     * @param folder the output folder, created if missing
     * @param files names and bytes
     * @return the paths written
     * @throws IOException if a file cannot be written; files already moved into place stay, the
     *     file being written is not left behind
     */
    public static List<Path> write(Path folder, Map<String, byte[]> files) throws IOException {
        Files.createDirectories(folder);
        Path real = folder.toRealPath();
        List<Path> written = new ArrayList<>();
        for (Map.Entry<String, byte[]> e : files.entrySet()) {
            Path target = real.resolve(safeName(e.getKey())).normalize();
            if (!real.equals(target.getParent())) {
                throw new IOException("refusing to write outside " + real + ": " + e.getKey());
            }
            writeAtomically(target, e.getValue());
            written.add(target);
        }
        return written;
    }

    /**
     * Writes one file under a temporary name beside it and moves it into place.
     *
     * @param target the file
     * @param bytes its content
     * @throws IOException if writing fails; the temporary file is removed
     */
    public static void writeAtomically(Path target, byte[] bytes) throws IOException {
        Path tmp = Files.createTempFile(target.getParent(), "." + target.getFileName() + ".", ".tmp");
        try {
            Files.write(tmp, bytes);
            try {
                // temporary files are private; a sheet is as readable as any file the user writes
                Files.setPosixFilePermissions(tmp, java.nio.file.attribute.PosixFilePermissions.fromString("rw-r--r--"));
            } catch (UnsupportedOperationException e) {
                // not a POSIX file system: the default permissions stand
            }
            try {
                Files.move(tmp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING);
            }
        } finally {
            Files.deleteIfExists(tmp);
        }
    }
}
