package coordination.plot.cli;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.PrintStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.stream.Stream;

/**
 * The run that {@code bin/coordination} records the class list of, once per jar, to build the
 * class-data archive every later run starts from. It exercises what users run: {@code check} as
 * text and JSON, {@code sheet} in every format, {@code faults}, {@code design} and
 * {@code withstand}, on the sample studies bundled in the jar, with every output discarded. Which
 * classes it loads decides only how fast later runs start, never what they print.
 */
public final class ArchiveTraining {
    /**
     * The studies trained on, among the samples the build bundles (all of them): a network, a
     * fuse, MCBs, kcmil; not sample 05, which fails on purpose. The one list of them.
     */
    static final List<String> STUDIES = List.of("01-main-switchboard-incomer.yaml", "02-filter-house-fuse.yaml",
            "03-dosing-room-mcbs.yaml", "04-clarifier-kcmil.yaml", "06-motor-control-centre-grading.yaml",
            "07-works-network.yaml");

    private ArchiveTraining() {
    }

    /**
     * Runs the training commands in a temporary folder, which is removed afterwards.
     *
     * @param args none
     * @throws IOException if the temporary folder cannot be written
     */
    public static void main(String[] args) throws IOException {
        System.setProperty("java.awt.headless", "true");
        Path dir = Files.createTempDirectory("coordination-training");
        try {
            run(dir);
        } finally {
            delete(dir);
        }
    }

    /**
     * The training commands over the bundled studies, written into a folder.
     *
     * @param dir an empty folder
     * @return the exit code of each command, in order
     * @throws IOException if the studies cannot be written there
     */
    static List<Integer> run(Path dir) throws IOException {
        List<String> files = new ArrayList<>();
        for (String name : STUDIES) {
            Path f = dir.resolve(name);
            try (InputStream in = ArchiveTraining.class.getResourceAsStream("training/" + name)) {
                if (in == null) {
                    throw new IOException("the jar holds no training study " + name);
                }
                Files.copy(in, f);
            }
            files.add(f.toString());
        }
        String network = files.get(files.size() - 1);
        PrintStream sink = new PrintStream(new ByteArrayOutputStream(), true, StandardCharsets.UTF_8);
        List<Integer> codes = new ArrayList<>();
        codes.add(Cli.run(sink, sink, with("check", files)));
        codes.add(Cli.run(sink, sink, with("check", List.of("--json", files.get(0)))));
        codes.add(Cli.run(sink, sink, with("check", List.of("--json", files.get(0), network))));
        // one study alone: the path that prepares the formats on a second thread
        codes.add(Cli.run(sink, sink, "sheet", files.get(0), "-o", dir.resolve("one").toString(), "--format",
                "svg,png,pdf", "--quiet"));
        codes.add(Cli.run(sink, sink, with("sheet", List.of(files.get(0), network, "-o", dir.resolve("out").toString(),
                "--format", "svg,png,pdf", "--quiet"))));
        codes.add(Cli.run(sink, sink, "faults", network, "--json"));
        codes.add(Cli.run(sink, sink, "design", files.get(0)));
        codes.add(Cli.run(sink, sink, "withstand", "--conductor", "copper", "--insulation", "xlpe", "--json"));
        return codes;
    }

    private static String[] with(String command, List<String> rest) {
        List<String> all = new ArrayList<>();
        all.add(command);
        all.addAll(rest);
        return all.toArray(String[]::new);
    }

    private static void delete(Path dir) throws IOException {
        try (Stream<Path> walk = Files.walk(dir)) {
            for (Path p : walk.sorted(Comparator.reverseOrder()).toList()) {
                Files.deleteIfExists(p);
            }
        } catch (UncheckedIOException e) {
            throw e.getCause();
        }
    }
}
