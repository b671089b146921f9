package coordination.plot.cli;

import static org.hamcrest.MatcherAssert.assertThat;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.is;
import static org.hamcrest.Matchers.not;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;

/** The command line under odd file names, folders and options: nothing overwritten, nothing forged. */
class HostileCliTest {
    private static final Path SAMPLES = Path.of("../samples");

    private static String sample() throws Exception {
        return Files.readString(SAMPLES.resolve("02-filter-house-fuse.yaml"));
    }

    @Test
    void longNamesKeepTheirExtensions(@TempDir Path tmp) throws Exception {
        String base = "n".repeat(130);
        Path in = tmp.resolve("in");
        Files.createDirectories(in);
        Files.writeString(in.resolve(base + ".yaml"), sample());
        Path out = tmp.resolve("out");
        InProcess.Run r = InProcess.run("sheet", in.toString(), "-o", out.toString());
        assertThat(r.err(), r.code(), is(ExitCodes.PASS));
        String cut = "n".repeat(100);
        assertThat(CliTest.files(out), is(List.of(cut + ".report.json", cut + ".svg")));
    }

    /** With -o the input folder, a long study name once cut its report name down to another study's file name. */
    @Test
    void noOutputIsWrittenOverAStudyFile(@TempDir Path tmp) throws Exception {
        String b = "b".repeat(115);
        Files.writeString(tmp.resolve(b + ".yaml"), sample());
        Files.writeString(tmp.resolve(b + ".yaml.extra.yaml"), sample());
        byte[] before = Files.readAllBytes(tmp.resolve(b + ".yaml"));
        InProcess.Run r = InProcess.run("sheet", tmp.toString(), "-o", tmp.toString());
        // both names are cut to the same 100 characters: a collision on the final names, refused
        assertThat(r.code(), is(ExitCodes.BAD_INPUT));
        assertThat(r.err(), containsString(b + ".yaml: writes " + "b".repeat(100) + ".svg, as "));
        assertThat("the study file was changed", java.util.Arrays.equals(before,
                Files.readAllBytes(tmp.resolve(b + ".yaml"))), is(true));
        assertThat(CliTest.files(tmp), is(List.of(b + ".yaml", b + ".yaml.extra.yaml")));
    }

    @Test
    void anOutputOverAnInputFileIsRefused(@TempDir Path tmp) throws Exception {
        Files.writeString(tmp.resolve("x.yaml"), sample());
        Files.writeString(tmp.resolve("x.svg"), "not a sheet");
        InProcess.Run r = InProcess.run("sheet", tmp.resolve("x.yaml").toString(), tmp.resolve("x.svg").toString(),
                "-o", tmp.toString());
        assertThat(r.code(), is(ExitCodes.BAD_INPUT));
        assertThat(r.err(), containsString("x.yaml: would write x.svg over a study file given to this run"));
        assertThat(Files.readString(tmp.resolve("x.svg")), is("not a sheet"));
    }

    /** Two studies that write the same names are refused; the others are still drawn. */
    @Test
    void aCollisionRefusesTheTwoStudiesNotTheBatch(@TempDir Path tmp) throws Exception {
        Path in = tmp.resolve("in");
        Files.createDirectories(in);
        Files.writeString(in.resolve("a.yaml"), sample());
        Files.writeString(in.resolve("a.yml"), sample());
        Files.writeString(in.resolve("b.yaml"), sample());
        Path out = tmp.resolve("out");
        InProcess.Run r = InProcess.run("sheet", in.toString(), "-o", out.toString());
        assertThat(r.code(), is(ExitCodes.BAD_INPUT));
        assertThat(r.err(), containsString("a.yaml: writes a.svg, as "));
        assertThat(r.err(), containsString("a.yml: writes a.svg, as "));
        assertThat(CliTest.files(out), is(List.of("b.report.json", "b.svg")));
        assertThat(r.out(), containsString("  not read: " + in.resolve("a.yaml") + ", " + in.resolve("a.yml")));
    }

    @Test
    void upperCaseExtensionsAreReadAndHiddenFilesSaySo(@TempDir Path tmp) throws Exception {
        Files.writeString(tmp.resolve("C.YAML"), sample());
        Files.writeString(tmp.resolve(".hidden.yaml"), sample());
        InProcess.Run r = InProcess.run("check", tmp.toString());
        assertThat(r.err(), r.code(), is(ExitCodes.PASS));
        assertThat(r.out(), containsString("C: Riverside WTW"));
        assertEquals(tmp.resolve(".hidden.yaml") + ": skipped - hidden files are not read from a folder; name the"
                + " file to read it\n", r.err());
    }

    @Test
    void aPipeIsNotCalledMissing(@TempDir Path tmp) throws Exception {
        Path fifo = tmp.resolve("pipe.yaml");
        Process p = new ProcessBuilder("mkfifo", fifo.toString()).start();
        assertThat(p.waitFor(), is(0));
        InProcess.Run r = InProcess.run("check", fifo.toString());
        assertThat(r.code(), is(ExitCodes.BAD_INPUT));
        assertEquals(fifo + ": not a regular file (a pipe, a device or a socket) - give a study file\n", r.err());
    }

    @Test
    void aControlCharacterInAFileNameIsEscapedAndRefused(@TempDir Path tmp) throws Exception {
        Path bad = tmp.resolve("bell\u0007\nforged.yaml");
        Files.writeString(bad, sample());
        InProcess.Run r = InProcess.run("check", bad.toString());
        assertThat(r.code(), is(ExitCodes.BAD_INPUT));
        assertThat(r.err(), is(tmp + "/bell\\u0007\\u000Aforged.yaml:1:1: the file name holds the control character"
                + " U+0007 - text in a study file is printable characters only; rename the file\n"));
    }

    @Test
    void formatNamesAreExact(@TempDir Path tmp) throws Exception {
        for (String f : new String[] {"SVG", " png", "pdf "}) {
            InProcess.Run r = InProcess.run("sheet", SAMPLES.resolve("02-filter-house-fuse.yaml").toString(), "-o",
                    tmp.toString(), "--format", f);
            assertThat(f, r.code(), is(ExitCodes.BAD_INPUT));
            assertThat(r.err(), containsString("format: found '" + f + "' - must be svg, png or pdf"));
        }
    }

    @Test
    void designShowsSmallCurrentsAsTheyAre(@TempDir Path tmp) throws Exception {
        Path s = tmp.resolve("small.yaml");
        Files.writeString(s, Files.readString(SAMPLES.resolve("05-blower-feeder-undersized.yaml"))
                .replace("fault_ka: {min: 1.0, max: 10}", "fault_ka: {min: 0.001, max: 10}"));
        InProcess.Run r = InProcess.run("design", s.toString());
        assertThat(r.out(), containsString("from 1 A to 10 kA"));
    }

    @Test
    void withstandReadsDoubleZeroAsTwoOught() {
        // ASTM B258: 00 AWG is 2/0, 133,100 cmil, 67.43 mm2; k = 143.1 for Cu XLPE 90-250 C, I(1 s) = kS
        InProcess.Run r = InProcess.run("withstand", "--conductor", "copper", "--insulation", "xlpe", "--size",
                "00 AWG", "--time", "1", "--output", "csv");
        assertThat(r.err(), r.code(), is(ExitCodes.PASS));
        assertThat(r.out(), containsString("\"00 AWG\",67.43088223591077,1,"));
    }

    /** The largest study the limits allow renders in 256 MB of heap, in a JVM of its own. */
    @Test
    @Timeout(value = 5, unit = TimeUnit.MINUTES)
    void theLargestAllowedStudyRendersIn256Megabytes(@TempDir Path tmp) throws Exception {
        StringBuilder b = new StringBuilder("format: 1\ntitle: Largest\nvoltage_kv: 0.4\ncables:\n");
        for (int i = 0; i < 200; i++) {
            b.append("  - {id: C").append(i).append(", conductor: copper, insulation: xlpe, size_mm2: ")
                    .append(16 + i % 8 * 20).append(", fault_ka: {min: 1, max: 20}}\n");
        }
        b.append("devices:\n");
        int fuses = 0;
        while (b.length() < 1_000_000) {
            double a = (50 + fuses) * 1.5;
            double t = 3000;
            StringBuilder melt = new StringBuilder();
            StringBuilder clear = new StringBuilder();
            for (int k = 0; k < 500; k++) {
                String sep = k == 0 ? "" : ",";
                melt.append(sep).append(String.format(java.util.Locale.ROOT, "[%.6g,%.6g]", a, t));
                clear.append(sep).append(String.format(java.util.Locale.ROOT, "[%.6g,%.6g]", a, t * 1.2));
                a *= 1.02;
                t /= 1.04;
            }
            String fuse = "  - id: F" + fuses + "\n    type: fuse\n    rating_a: " + (50 + fuses) + "\n    melting: ["
                    + melt + "]\n    clearing: [" + clear + "]\n";
            if (b.length() + fuse.length() + 200 * 40 > 1_040_000) {
                break;
            }
            b.append(fuse);
            fuses++;
        }
        b.append("checks:\n");
        for (int i = 0; i < 200; i++) {
            b.append("  - {cable: C").append(i).append(", device: F").append(i % fuses).append("}\n");
        }
        Path study = tmp.resolve("largest.yaml");
        Files.writeString(study, b);
        String javaExe = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        Process p = new ProcessBuilder(javaExe, "-Xmx256m", "-Djava.awt.headless=true", "-cp",
                System.getProperty("java.class.path"), Cli.class.getName(), "sheet", study.toString(), "-o",
                tmp.resolve("out").toString(), "--format", "svg,png,pdf").redirectErrorStream(true).start();
        String output = new String(p.getInputStream().readAllBytes(), java.nio.charset.StandardCharsets.UTF_8);
        assertThat(output, p.waitFor(), is(ExitCodes.CHECK_FAILED));
        assertThat(output, not(containsString("internal error")));
        assertThat(output, containsString("4 files in"));
    }
}
