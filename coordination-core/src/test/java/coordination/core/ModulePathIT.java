package coordination.core;

import static org.hamcrest.MatcherAssert.assertThat;
import static org.hamcrest.Matchers.is;

import java.io.File;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A modular application that {@code requires coordination.core}, compiled and run on the module
 * path against the packaged jar: its descriptor must pull in what the reader and the engine use, and
 * its values must cross a serialization round trip there.
 */
class ModulePathIT {
    private static final String MAIN = """
            package demo;

            import coordination.core.study.StudyReader;
            import coordination.core.study.StudyReport;
            import coordination.core.study.ReportWriter;
            import coordination.core.study.Study;
            import java.io.ByteArrayInputStream;
            import java.io.ByteArrayOutputStream;
            import java.io.ObjectInputStream;
            import java.io.ObjectOutputStream;
            import java.nio.file.Path;

            public class Main {
                public static void main(String[] args) throws Exception {
                    Study study = StudyReader.read(Path.of(args[0]));
                    StudyReport r = StudyReport.evaluate(study);
                    // the values cross a serialization round trip on the module path too
                    ByteArrayOutputStream bytes = new ByteArrayOutputStream();
                    try (ObjectOutputStream out = new ObjectOutputStream(bytes)) {
                        out.writeObject(study);
                        out.writeObject(r);
                    }
                    try (ObjectInputStream in = new ObjectInputStream(new ByteArrayInputStream(bytes.toByteArray()))) {
                        Study studyBack = (Study) in.readObject();
                        StudyReport back = (StudyReport) in.readObject();
                        boolean same = ReportWriter.write(back).equals(ReportWriter.write(r))
                                && ReportWriter.write(StudyReport.evaluate(studyBack)).equals(ReportWriter.write(r));
                        System.out.println(r.results().size() + " " + ReportWriter.write(r).length() + " " + same);
                    }
                }
            }
            """;

    @Test
    void aModularApplicationReadsAndRunsAStudy(@TempDir Path tmp) throws Exception {
        String modulePath = Arrays.stream(System.getProperty("java.class.path").split(File.pathSeparator))
                .filter(e -> e.endsWith(".jar") && !e.contains("junit") && !e.contains("opentest4j")
                        && !e.contains("apiguardian") && !e.contains("hamcrest"))
                .collect(Collectors.joining(File.pathSeparator));
        Path src = tmp.resolve("src/demo.app");
        Files.createDirectories(src.resolve("demo"));
        Files.writeString(src.resolve("module-info.java"), "module demo.app { requires coordination.core; }\n");
        Files.writeString(src.resolve("demo/Main.java"), MAIN);
        Path out = tmp.resolve("out");
        Path bin = Path.of(System.getProperty("java.home"), "bin");
        assertThat(run(List.of(bin.resolve("javac").toString(), "-d", out.toString(), "--module-path", modulePath,
                "--module-source-path", tmp.resolve("src").toString(), "-m", "demo.app")).exitValue(), is(0));
        String java = bin.resolve("java").toString();
        Process p = run(List.of(java, "--module-path", out + File.pathSeparator + modulePath, "-m",
                "demo.app/demo.Main", Path.of("../samples/01-main-switchboard-incomer.yaml").toString()));
        String printed = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertThat(printed, p.exitValue(), is(0));
        assertThat(printed, printed.startsWith("4 "), is(true));
        assertThat(printed, printed.strip().endsWith(" true"), is(true));
    }

    private static Process run(List<String> command) throws Exception {
        Process p = new ProcessBuilder(command).redirectErrorStream(true).redirectOutput(ProcessBuilder.Redirect.PIPE)
                .start();
        // a guard against a hang only
        assertThat(String.join(" ", command), p.waitFor(60, TimeUnit.SECONDS), is(true));
        return p;
    }
}
