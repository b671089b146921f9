package coordination.samples.spark;

import coordination.core.study.Problem;
import coordination.core.study.ReportWriter;
import coordination.core.study.Study;
import coordination.core.study.StudyFileException;
import coordination.core.study.StudyReader;
import coordination.core.study.StudyReport;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.net.URI;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.List;
import org.apache.spark.api.java.function.MapFunction;
import org.apache.spark.sql.Dataset;
import org.apache.spark.sql.Encoders;
import org.apache.spark.sql.Row;
import org.apache.spark.sql.SaveMode;
import org.apache.spark.sql.SparkSession;

/**
 * Checks every study file under a folder on Apache Spark: the executors read and check the studies and write
 * one JSON report per study, the same bytes as {@code coordination check --json STUDY}; the driver writes a
 * summary table.
 *
 * <p>Reports are written with {@code java.nio} from the executors, so on a cluster the output folder must be
 * one every executor reaches (a shared mount). A study that cannot be read gets {@code NAME.errors.txt} with
 * the located error lines the command line prints, and the verdict {@code not-read} in the summary. Spark's
 * file listing skips names that start with {@code .} or {@code _}: the command line skips only the first.
 */
public final class CheckStudiesJob {
    /** The verdict of a study that could not be read. */
    public static final String NOT_READ = "not-read";

    private CheckStudiesJob() {
    }

    /**
     * Runs the job.
     *
     * @param spark the session
     * @param input the folder of study files, searched in its subfolders ({@code *.yaml}, {@code *.yml})
     * @param output the folder for {@code reports/} (the folders of the input kept) and {@code summary/} (CSV)
     * @return one row per study, ordered by file: the study's outcome without its report text
     */
    public static List<Outcome> run(SparkSession spark, Path input, Path output) {
        Path root = input.toAbsolutePath().normalize();
        Path reports = output.toAbsolutePath().normalize().resolve("reports");
        String rootText = root.toString();
        String reportsText = reports.toString();
        Dataset<Row> files = spark.read().format("binaryFile").option("recursiveFileLookup", "true")
                .option("pathGlobFilter", "*.{yaml,yml,YAML,YML}").load(rootText);
        Dataset<Outcome> outcomes = files.select("path", "content")
                .map((MapFunction<Row, Outcome>) row -> check(row.getString(0), row.getAs(1), rootText, reportsText),
                        Encoders.bean(Outcome.class))
                .cache();
        outcomes.createOrReplaceTempView("studies");
        Dataset<Row> summary = spark.sql("SELECT file, study, verdict, checks, failing, errors FROM studies"
                + " ORDER BY file");
        summary.coalesce(1).write().mode(SaveMode.Overwrite).option("header", "true")
                .csv(output.resolve("summary").toAbsolutePath().toString());
        List<Outcome> rows = outcomes.orderBy("file").collectAsList();
        outcomes.unpersist();
        return rows;
    }

    /** Reads and checks one study in an executor and writes its report; never throws for a bad study. */
    static Outcome check(String uri, byte[] content, String root, String reports) throws IOException {
        Path file = Path.of(URI.create(uri));
        Path relative = Path.of(root).relativize(file);
        String name = file.getFileName().toString();
        // the outputs' name, as the command line's; the study itself takes its name from the reader
        int dot = name.lastIndexOf('.');
        String base = dot > 0 ? name.substring(0, dot) : name;
        Path folder = Path.of(reports).resolve(relative).getParent();
        Outcome o = new Outcome();
        o.setFile(relative.toString());
        o.setStudy(base);
        Study study;
        try {
            study = StudyReader.read(file, content);
        } catch (StudyFileException e) {
            List<String> lines = new ArrayList<>();
            for (Problem p : e.problems()) {
                lines.add(p.toString());
            }
            o.setVerdict(NOT_READ);
            o.setErrors(lines.size());
            write(folder.resolve(base + ".errors.txt"), String.join("\n", lines) + "\n");
            return o;
        }
        StudyReport report = StudyReport.evaluate(study);
        o.setVerdict(report.pass() ? "pass" : "fail");
        o.setChecks(report.results().size());
        o.setFailing((int) report.results().stream().filter(r -> !r.pass()).count());
        write(folder.resolve(base + ".json"), ReportWriter.write(report));
        return o;
    }

    /** Writes through a temporary file, so a report is either whole or absent. */
    private static void write(Path target, String text) throws IOException {
        Files.createDirectories(target.getParent());
        Path temp = Files.createTempFile(target.getParent(), ".part-", ".tmp");
        try {
            Files.writeString(temp, text, StandardCharsets.UTF_8);
            Files.move(temp, target, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        } catch (IOException | UncheckedIOException e) {
            Files.deleteIfExists(temp);
            throw e;
        }
    }

    /**
     * Runs the job in local mode: {@code INPUT OUTPUT [MASTER]}.
     *
     * @param args the input folder, the output folder and optionally the master URL (default {@code local[*]})
     */
    public static void main(String[] args) {
        if (args.length < 2 || args.length > 3) {
            System.err.println("usage: CheckStudiesJob INPUT OUTPUT [MASTER]");
            System.exit(2);
        }
        SparkSession spark = SparkSession.builder().appName("coordination check")
                .master(args.length == 3 ? args[2] : "local[*]").getOrCreate();
        List<Outcome> rows;
        try {
            rows = run(spark, Path.of(args[0]), Path.of(args[1]));
        } finally {
            spark.stop();
        }
        java.util.Map<String, Long> counts = new java.util.TreeMap<>();
        rows.forEach(r -> counts.merge(r.getVerdict(), 1L, Long::sum));
        System.out.println("studies: " + rows.size() + " " + counts);
        System.exit(rows.stream().allMatch(r -> r.getVerdict().equals("pass")) ? 0 : 1);
    }
}
