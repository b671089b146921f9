package coordination.plot.cli;

import coordination.plot.sheet.OutputFormat;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.TreeMap;

/**
 * What {@code sheet --incremental} drew before: for each study, a digest of everything its outputs
 * depend on (the study's bytes, the formats, the resolution and the tool itself), its verdict and
 * the files it wrote. A study whose digest matches and whose files are all still there is not
 * drawn again. Anything unreadable in the cache counts as no cache: the studies are drawn.
 */
final class OutputCache {
    /** The cache's name in the output folder: hidden, and not a study name. */
    static final String FILE = ".coordination-cache";
    private static final String HEADER = "coordination sheet cache 1";

    /**
     * One study's last drawing.
     *
     * @param digest the digest of its inputs
     * @param pass whether every check passed
     * @param files the files written, by name
     */
    record Entry(String digest, boolean pass, List<String> files) {
    }

    private final Map<String, Entry> entries;

    private OutputCache(Map<String, Entry> entries) {
        this.entries = entries;
    }

    static OutputCache load(Path dir) {
        Map<String, Entry> entries = new TreeMap<>();
        Path file = dir.resolve(FILE);
        try {
            if (!Files.isRegularFile(file)) {
                return new OutputCache(entries);
            }
            List<String> lines = Files.readAllLines(file, StandardCharsets.UTF_8);
            if (lines.isEmpty() || !lines.get(0).equals(HEADER)) {
                return new OutputCache(entries);
            }
            for (String line : lines.subList(1, lines.size())) {
                String[] f = line.split("\t", -1);
                if (f.length != 4 || !(f[2].equals("pass") || f[2].equals("fail"))) {
                    return new OutputCache(new TreeMap<>());
                }
                entries.put(f[0], new Entry(f[1], f[2].equals("pass"), List.of(f[3].split("/"))));
            }
        } catch (IOException | RuntimeException e) {
            return new OutputCache(new TreeMap<>());
        }
        return new OutputCache(entries);
    }

    /** The last drawing of a study, if its inputs are the same and its files are all in the folder. */
    Optional<Entry> unchanged(String base, String digest, Path dir) {
        Entry e = entries.get(base);
        if (e == null || !e.digest().equals(digest)) {
            return Optional.empty();
        }
        for (String f : e.files()) {
            if (!Files.isRegularFile(dir.resolve(f))) {
                return Optional.empty();
            }
        }
        return Optional.of(e);
    }

    void put(String base, Entry e) {
        entries.put(base, e);
    }

    void forget(String base) {
        entries.remove(base);
    }

    /** Writes the cache beside the outputs, under a temporary name first. */
    void save(Path dir) throws IOException {
        StringBuilder b = new StringBuilder(HEADER).append('\n');
        entries.forEach((k, v) -> b.append(k).append('\t').append(v.digest()).append('\t')
                .append(v.pass() ? "pass" : "fail").append('\t').append(String.join("/", v.files())).append('\n'));
        Files.createDirectories(dir);
        Path tmp = Files.createTempFile(dir, ".coordination-cache", ".tmp");
        Files.writeString(tmp, b, StandardCharsets.UTF_8);
        Files.move(tmp, dir.resolve(FILE), StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
    }

    /**
     * The digest of everything a study's outputs depend on.
     *
     * @param study the study file's bytes
     * @param tool the tool's own digest
     * @param formats the formats drawn
     * @param dpi the PNG resolution
     * @return SHA-256, in hexadecimal
     */
    static String digest(byte[] study, String tool, Set<OutputFormat> formats, int dpi) {
        MessageDigest d = sha256();
        d.update((tool + "\n" + new java.util.TreeSet<>(formats) + "\n" + dpi + "\n").getBytes(StandardCharsets.UTF_8));
        d.update(study);
        return HexFormat.of().formatHex(d.digest());
    }

    /**
     * The tool's own digest: of the jar it runs from, so that a rebuilt tool draws everything again
     * even when its version string is the same; of its version where it runs from classes.
     */
    static String tool() {
        String version = String.valueOf(OutputCache.class.getPackage().getImplementationVersion());
        try {
            Path code = Path.of(OutputCache.class.getProtectionDomain().getCodeSource().getLocation().toURI());
            if (Files.isRegularFile(code)) {
                MessageDigest d = sha256();
                try (InputStream in = Files.newInputStream(code)) {
                    byte[] buf = new byte[1 << 16];
                    for (int n = in.read(buf); n > 0; n = in.read(buf)) {
                        d.update(buf, 0, n);
                    }
                }
                return version + ":" + HexFormat.of().formatHex(d.digest());
            }
        } catch (IOException | java.net.URISyntaxException | RuntimeException e) {
            // no jar to read: the version alone
        }
        return version + ":classes";
    }

    private static MessageDigest sha256() {
        try {
            return MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is required of every Java platform", e);
        }
    }
}
