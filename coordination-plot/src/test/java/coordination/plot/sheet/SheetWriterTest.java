package coordination.plot.sheet;

import static org.hamcrest.MatcherAssert.assertThat;
import static org.hamcrest.Matchers.is;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** A study's files are one set: a failure at any move leaves the folder exactly as it was. */
class SheetWriterTest {
    private static Map<String, byte[]> set(String content) {
        Map<String, byte[]> m = new LinkedHashMap<>();
        for (String name : List.of("s.svg", "s.png", "s.report.json")) {
            m.put(name, (name + " " + content).getBytes(StandardCharsets.UTF_8));
        }
        return m;
    }

    private static Map<String, String> folder(Path dir) throws IOException {
        Map<String, String> m = new java.util.TreeMap<>();
        try (Stream<Path> s = Files.list(dir)) {
            for (Path p : s.toList()) {
                m.put(p.getFileName().toString(), Files.readString(p));
            }
        }
        return m;
    }

    /** Fails the n-th move: the first three put the old files aside, the next three put the new ones in place. */
    @ParameterizedTest(name = "failing move {0}")
    @ValueSource(ints = {1, 2, 3, 4, 5, 6})
    void aFailedMoveRestoresTheOldSet(int failing, @TempDir Path dir) throws Exception {
        SheetWriter.write(dir, set("old"));
        Map<String, String> before = folder(dir);
        int[] moves = {0};
        SheetWriter.Mover flaky = (from, to) -> {
            if (++moves[0] == failing) {
                throw new IOException("simulated failure at move " + failing);
            }
            java.nio.file.Files.move(from, to, java.nio.file.StandardCopyOption.REPLACE_EXISTING);
        };
        assertThrows(IOException.class, () -> SheetWriter.write(dir, set("new"), flaky));
        assertThat(folder(dir), is(before));
    }

    @ParameterizedTest(name = "name [{0}]")
    @ValueSource(strings = {"../s.svg", ".hidden", "a/b.svg", ""})
    void namesThatLeaveThePlainFolderAreRefused(String name, @TempDir Path dir) throws Exception {
        assertThrows(IOException.class, () -> SheetWriter.write(dir, Map.of(name, new byte[] {1})));
        assertThat(folder(dir), is(Map.of()));
    }
}
