package coordination.plot.jar;

import static org.hamcrest.MatcherAssert.assertThat;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.greaterThan;
import static org.hamcrest.Matchers.is;
import static org.hamcrest.Matchers.not;

import java.io.File;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.zip.ZipEntry;
import java.util.zip.ZipFile;
import org.junit.jupiter.api.Test;

/** The runnable jar, as packaged: what it must carry for others to redistribute it. */
class RunnableJarIT {
    private static final Path JAR = Path.of("target/coordination.jar");

    /** The libraries bundled in the runnable jar: those on the class path whose classes it holds. */
    private static List<ZipFile> bundled(ZipFile fat) throws IOException {
        List<ZipFile> out = new ArrayList<>();
        for (String entry : System.getProperty("java.class.path").split(File.pathSeparator)) {
            if (!entry.endsWith(".jar") || entry.contains("junit") || entry.contains("hamcrest")
                    || entry.contains("opentest4j") || entry.contains("apiguardian")) {
                continue;
            }
            ZipFile lib = new ZipFile(entry);
            String firstClass = lib.stream().map(ZipEntry::getName).filter(n -> n.endsWith(".class")
                    && !n.endsWith("module-info.class") && !n.startsWith("META-INF/")).findFirst().orElse(null);
            if (firstClass != null && fat.getEntry(firstClass) != null) {
                out.add(lib);
            } else {
                lib.close();
            }
        }
        return out;
    }

    private static String text(ZipFile z, String name) throws IOException {
        ZipEntry e = z.getEntry(name);
        return e == null ? null : new String(z.getInputStream(e).readAllBytes(), StandardCharsets.UTF_8);
    }

    private static String firstLine(String s) {
        return s.lines().map(String::strip).filter(l -> !l.isEmpty() && !l.startsWith("#")).findFirst().orElse("");
    }

    @Test
    void everyBundledNoticeAndLicenceIsKept() throws Exception {
        try (ZipFile fat = new ZipFile(JAR.toFile())) {
            String notice = text(fat, "META-INF/NOTICE");
            String licences = text(fat, "META-INF/LICENSE") + text(fat, "META-INF/LICENSE.txt");
            List<ZipFile> libs = bundled(fat);
            assertThat(libs.size(), greaterThan(15));
            int notices = 0;
            for (ZipFile lib : libs) {
                for (String name : new String[] {"META-INF/NOTICE", "META-INF/NOTICE.txt"}) {
                    String own = text(lib, name);
                    if (own != null) {
                        notices++;
                        assertThat(lib.getName() + " " + name, notice, containsString(firstLine(own)));
                    }
                }
                for (String name : new String[] {"META-INF/LICENSE", "META-INF/LICENSE.txt"}) {
                    String own = text(lib, name);
                    if (own != null) {
                        assertThat(lib.getName() + " " + name, licences, containsString(own.strip()));
                    }
                }
                lib.close();
            }
            // PDFBox, FontBox, PDFBox io, Commons Math, Commons Logging, Commons IO, Jackson, Batik, XML Graphics
            assertThat(notices, greaterThan(10));
            assertThat(text(fat, "META-INF/NOTICE"), containsString("Apache PDFBox"));
            assertThat(text(fat, "coordination/plot/fonts/LICENSE"), containsString("SIL OPEN FONT LICENSE"));
        }
    }

    @Test
    void everyBundledLibraryIsListedAndNoneIsCopyleft() throws Exception {
        try (ZipFile fat = new ZipFile(JAR.toFile())) {
            String listed = text(fat, "META-INF/THIRD-PARTY.txt");
            for (ZipFile lib : bundled(fat)) {
                String file = Path.of(lib.getName()).getFileName().toString();
                // this module's own jar is the product, not a third party
                if (!file.startsWith("coordination-plot-")) {
                    String artifact = file.replaceFirst("-\\d[^-]*(-SNAPSHOT)?\\.jar$", "");
                    assertThat(file, listed, containsString(":" + artifact + ":"));
                }
                lib.close();
            }
            // an Apache-2.0 library that firms embed cannot carry a GPL part
            assertThat(listed.toUpperCase(Locale.ROOT), not(containsString("GPL")));
            assertThat(listed.toUpperCase(Locale.ROOT).contains("GENERAL PUBLIC"), is(false));
        }
    }
}
