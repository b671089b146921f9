package coordination.plot.jar;

import static org.hamcrest.MatcherAssert.assertThat;
import static org.hamcrest.Matchers.is;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** bin/coordination, as packaged: the same output and exit code as the jar, with its archive made once. */
class LauncherIT {
    private static final Path LAUNCHER = Path.of("target/bin/coordination");
    private static final Path ARCHIVE = Path.of("target/coordination.jsa");
    private static final String JAVA = Path.of(System.getProperty("java.home"), "bin", "java").toString();
    private static final String STUDY = Path.of("../samples/05-blower-feeder-undersized.yaml").toString();

    private record Run(int code, String out) {
    }

    /** Runs a command with JAVA naming the JVM this test runs on, for the launcher to use. */
    private static Run run(List<String> command) throws Exception {
        ProcessBuilder b = new ProcessBuilder(command).redirectError(ProcessBuilder.Redirect.DISCARD);
        b.environment().put("JAVA", JAVA);
        Process p = b.start();
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        // a guard against a hang only
        assertThat(p.waitFor(60, TimeUnit.SECONDS), is(true));
        return new Run(p.exitValue(), out);
    }

    private static List<String> java(String... args) {
        List<String> c = new ArrayList<>(List.of(JAVA, "-jar", "target/coordination.jar"));
        c.addAll(List.of(args));
        return c;
    }

    private static List<String> launcher(String... args) {
        List<String> c = new ArrayList<>(List.of("/bin/sh", LAUNCHER.toString()));
        c.addAll(List.of(args));
        return c;
    }

    @Test
    void theLauncherRunsTheJarAndKeepsItsArchive() throws Exception {
        assumeTrue(Files.isExecutable(Path.of("/bin/sh")), "a POSIX shell");
        Files.deleteIfExists(ARCHIVE);
        Run jar = run(java("check", "--json", STUDY));
        assertThat(jar.code(), is(1));
        Run first = run(launcher("check", "--json", STUDY));
        assertThat(first, is(jar));
        assertThat(Files.isRegularFile(ARCHIVE), is(true));
        Run second = run(launcher("check", "--json", STUDY));
        assertThat(second, is(jar));
        // the training's class list and temporary archive are gone, and no crash report was left behind
        try (var beside = Files.list(ARCHIVE.getParent()); var here = Files.list(Path.of("."))) {
            assertThat(beside.map(f -> f.getFileName().toString())
                    .filter(n -> n.startsWith("coordination.jsa.") || n.startsWith("hs_err")).toList(), is(List.of()));
            assertThat(here.map(f -> f.getFileName().toString()).filter(n -> n.startsWith("hs_err")).toList(),
                    is(List.of()));
        }
    }

    @Test
    void aSheetFromTheLauncherIsTheJarsSheet(@TempDir Path tmp) throws Exception {
        assumeTrue(Files.isExecutable(Path.of("/bin/sh")), "a POSIX shell");
        Path viaJar = tmp.resolve("jar");
        Path viaLauncher = tmp.resolve("launcher");
        assertThat(run(java("sheet", STUDY, "-o", viaJar.toString(), "--quiet")).code(), is(1));
        assertThat(run(launcher("sheet", STUDY, "-o", viaLauncher.toString(), "--quiet")).code(), is(1));
        for (String name : List.of("05-blower-feeder-undersized.svg", "05-blower-feeder-undersized.report.json")) {
            assertThat(name, Files.readAllBytes(viaLauncher.resolve(name)), is(Files.readAllBytes(viaJar.resolve(name))));
        }
    }
}
