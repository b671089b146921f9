package coordination.samples.spark;

import static org.hamcrest.MatcherAssert.assertThat;
import static org.hamcrest.Matchers.contains;
import static org.hamcrest.Matchers.is;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.apache.spark.sql.SparkSession;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;

/**
 * The Spark job on the sample studies in local mode, compared byte for byte with the command line of the
 * packaged jar run on the same files.
 */
@Timeout(value = 10, unit = TimeUnit.MINUTES)
class CheckStudiesJobTest {
    private static SparkSession spark;

    @BeforeAll
    static void start() {
        spark = SparkSession.builder().appName("coordination-test").master("local[2]")
                .config("spark.ui.enabled", "false").config("spark.sql.shuffle.partitions", "2").getOrCreate();
    }

    @AfterAll
    static void stop() {
        spark.stop();
    }

    /** The sample studies, one of them in a subfolder, and one that cannot be read. */
    private static Path input(Path dir) throws IOException {
        Path in = Files.createDirectories(dir.resolve("in"));
        Path nested = Files.createDirectories(in.resolve("network"));
        try (Stream<Path> s = Files.list(Path.of("..").toAbsolutePath().normalize())) {
            for (Path p : s.filter(f -> f.toString().endsWith(".yaml")).sorted().toList()) {
                Path target = p.getFileName().toString().startsWith("07-") ? nested : in;
                Files.copy(p, target.resolve(p.getFileName()));
            }
        }
        String broken = Files.readString(in.resolve("05-blower-feeder-undersized.yaml"))
                .replace("voltage_kv:", "voltage_kv: [1]\nunknown_key:");
        Files.writeString(in.resolve("broken.yaml"), broken);
        return in;
    }

    private record Run(int exit, byte[] out, String err) {
    }

    /** The packaged command line, in its own JVM, as a user runs it. */
    private static Run cli(Path study) throws Exception {
        Path jar = Path.of(System.getProperty("coordination.jar", "../../coordination-plot/target/coordination.jar"));
        if (!Files.isRegularFile(jar)) {
            throw new AssertionError(jar + " is missing: build coordination-plot first (see README)");
        }
        Path java = Path.of(System.getProperty("java.home"), "bin", "java");
        Process p = new ProcessBuilder(java.toString(), "-jar", jar.toString(), "check", "--json", study.toString())
                .redirectError(ProcessBuilder.Redirect.PIPE).start();
        p.getOutputStream().close();
        byte[] out = p.getInputStream().readAllBytes();
        String err = new String(p.getErrorStream().readAllBytes(), StandardCharsets.UTF_8);
        return new Run(p.waitFor(), out, err);
    }

    @Test
    void everyReportEqualsTheCommandLinesAndTheSummaryListsEveryStudy(@TempDir Path dir) throws Exception {
        Path in = input(dir);
        Path out = dir.resolve("out");
        List<Outcome> rows = CheckStudiesJob.run(spark, in, out);

        List<Path> studies;
        try (Stream<Path> s = Files.walk(in)) {
            studies = s.filter(f -> f.toString().endsWith(".yaml")).sorted().toList();
        }
        assertThat(rows.size(), is(studies.size()));
        List<String> fromCli = new ArrayList<>();
        for (Path study : studies) {
            Run r = cli(study);
            Path rel = in.relativize(study);
            String base = study.getFileName().toString().replaceFirst("\\.yaml$", "");
            Path folder = rel.getParent() == null ? out.resolve("reports") : out.resolve("reports").resolve(rel
                    .getParent());
            Outcome row = rows.stream().filter(o -> o.getFile().equals(rel.toString())).findFirst().orElseThrow();
            if (r.exit() == 2) {
                assertThat(rel + ": the job wrote a report for a study the command line cannot read",
                        Files.exists(folder.resolve(base + ".json")), is(false));
                assertThat(rel.toString(), Files.readString(folder.resolve(base + ".errors.txt")), is(r.err()));
                assertThat(row.getVerdict(), is(CheckStudiesJob.NOT_READ));
                assertThat(row.getErrors(), is((int) r.err().lines().count()));
            } else {
                byte[] job = Files.readAllBytes(folder.resolve(base + ".json"));
                assertThat(rel + ": report differs from `check --json`", new String(job, StandardCharsets.UTF_8),
                        is(new String(r.out(), StandardCharsets.UTF_8)));
                assertThat(rel.toString(), java.util.Arrays.equals(job, r.out()), is(true));
                assertThat(rel.toString(), row.getVerdict(), is(r.exit() == 0 ? "pass" : "fail"));
            }
            fromCli.add(rel + "," + base + "," + (r.exit() == 0 ? "pass" : r.exit() == 1 ? "fail" : "not-read"));
        }

        List<String> csv;
        try (Stream<Path> s = Files.list(out.resolve("summary"))) {
            Path part = s.filter(f -> f.getFileName().toString().endsWith(".csv")).findFirst().orElseThrow();
            csv = Files.readAllLines(part);
        }
        assertThat(csv.get(0), is("file,study,verdict,checks,failing,errors"));
        List<String> fromJob = csv.subList(1, csv.size()).stream()
                .map(l -> String.join(",", List.of(l.split(",")).subList(0, 3))).toList();
        assertThat(fromJob, contains(fromCli.toArray()));
    }
}
