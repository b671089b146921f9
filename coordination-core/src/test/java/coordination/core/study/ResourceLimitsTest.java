package coordination.core.study;

import static org.hamcrest.MatcherAssert.assertThat;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.is;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;

import java.io.RandomAccessFile;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Hostile inputs are refused with one clear line and without reading them whole. The assertions
 * are about the bounded work (the lines reported, the bytes read); the time limit only guards
 * against a hang and is generous, since CI machines are loaded.
 */
class ResourceLimitsTest {
    private static final Duration LIMIT = Duration.ofSeconds(60);

    private static String refusal(String text) {
        StudyFileException e = assertTimeoutPreemptively(LIMIT,
                () -> assertThrows(StudyFileException.class, () -> StudyReader.parse("hostile.yaml", "h", text)));
        return e.problems().get(0).toString();
    }

    @Test
    void aliasBombIsRefused() {
        StringBuilder b = new StringBuilder("a: &a [\"lol\",\"lol\",\"lol\",\"lol\",\"lol\",\"lol\",\"lol\",\"lol\",\"lol\"]\n");
        for (char c = 'b'; c <= 'i'; c++) {
            char p = (char) (c - 1);
            b.append(c).append(": &").append(c).append(" [");
            for (int i = 0; i < 9; i++) {
                b.append(i == 0 ? "" : ",").append('*').append(p);
            }
            b.append("]\n");
        }
        assertThat(refusal(b.toString()), containsString("YAML anchors (&a) are not allowed"));
    }

    @Test
    void fiftyMegabyteFileIsRefusedBeforeReading(@TempDir Path tmp) throws Exception {
        Path big = tmp.resolve("big.yaml");
        try (RandomAccessFile f = new RandomAccessFile(big.toFile(), "rw")) {
            f.setLength(50L * 1024 * 1024);
        }
        StudyFileException e = assertTimeoutPreemptively(LIMIT,
                () -> assertThrows(StudyFileException.class, () -> StudyReader.read(big)));
        assertThat(e.getMessage(), is(big + ":1:1: the file is 52428800 bytes - study files are limited to 1048576"
                + " bytes (1 MiB)"));
    }

    /** Bytes read elsewhere (a batch engine's input) meet the same checks and messages as the file. */
    @Test
    void bytesReadElsewhereAreCheckedAsTheFileIs(@TempDir Path tmp) throws Exception {
        Path big = tmp.resolve("big.yaml");
        byte[] tooMany = new byte[(int) StudyReader.MAX_FILE_BYTES + 1];
        Files.write(big, tooMany);
        StudyFileException fromFile = assertThrows(StudyFileException.class, () -> StudyReader.read(big));
        StudyFileException fromBytes = assertThrows(StudyFileException.class, () -> StudyReader.read(big, tooMany));
        assertThat(fromBytes.getMessage(), is(fromFile.getMessage()));

        Path badName = tmp.resolve("bad\u202ename.yaml");
        byte[] study = "format: 1\ntitle: t\nvoltage_kv: 0.4\n".getBytes(java.nio.charset.StandardCharsets.UTF_8);
        Files.write(badName, study);
        assertThat(assertThrows(StudyFileException.class, () -> StudyReader.read(badName, study)).getMessage(),
                is(assertThrows(StudyFileException.class, () -> StudyReader.read(badName)).getMessage()));

        Path good = tmp.resolve("feeder.yaml");
        Files.write(good, study);
        assertThat(StudyReader.read(good, study).name(), is(StudyReader.read(good).name()));
        assertThat(StudyReader.read(good, study).name(), is("feeder"));
    }

    @Test
    void documentNestedTenThousandDeepIsRefused() {
        String deep = "title: " + "[".repeat(10_000) + "]".repeat(10_000) + "\n";
        assertThat(refusal(deep), containsString("nested deeper than 40 levels"));
    }

    @Test
    void mappingsNestedDeeperThanTheLimitAreRefused() {
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < 45; i++) {
            b.append("  ".repeat(i)).append("k").append(i).append(":\n");
        }
        b.append("  ".repeat(45)).append("v: 1\n");
        assertThat(refusal(b.toString()), containsString("nested deeper than 40 levels"));
    }

    @Test
    void fuseWithAMillionPointsIsRefusedBySize(@TempDir Path tmp) throws Exception {
        StringBuilder b = new StringBuilder("format: 1\ntitle: t\nvoltage_kv: 0.4\ndevices:\n  - id: F\n    type: fuse\n"
                + "    rating_a: 100\n    melting: [");
        for (int i = 0; i < 1_000_000; i++) {
            b.append(i == 0 ? "" : ", ").append('[').append(100 + i).append(", ").append(1e6 / (i + 1)).append(']');
        }
        b.append("]\n");
        Path f = tmp.resolve("fuse.yaml");
        Files.writeString(f, b);
        StudyFileException e = assertTimeoutPreemptively(LIMIT,
                () -> assertThrows(StudyFileException.class, () -> StudyReader.read(f)));
        assertThat(e.getMessage(), containsString("study files are limited to 1048576 bytes (1 MiB)"));
    }

    @Test
    void fuseJustOverThePointLimitIsRefusedWithTheLimit() {
        StringBuilder b = new StringBuilder("format: 1\ntitle: t\nvoltage_kv: 0.4\ndevices:\n  - id: F\n    type: fuse\n"
                + "    rating_a: 100\n    clearing: [[200, 100], [400, 1]]\n    melting: [");
        for (int i = 0; i < 20_000; i++) {
            b.append(i == 0 ? "" : ", ").append('[').append(100 + i).append(", ").append(1e6 / (i + 1)).append(']');
        }
        b.append("]\n");
        assertThat(refusal(b.toString()), is("hostile.yaml:9:14: devices[0].melting: found 20000 points - at most 500"
                + " are accepted"));
    }

    @Test
    void longQuotedStringIsRefusedQuickly() {
        String text = "format: 1\ntitle: \"" + "a".repeat(900_000) + "\"\nvoltage_kv: 0.4\n";
        assertThat(refusal(text), is("hostile.yaml:2:8: title: found text of 900000 characters - at most 500 are"
                + " accepted"));
    }
}
