package coordination.plot.cli;

import coordination.plot.sheet.Drawing;
import coordination.plot.sheet.OutputFormat;
import java.io.IOException;
import java.util.Set;

/**
 * The first-use work of drawing, done on a second core while the first study is read, checked
 * and laid out: loading the faces and the platform's graphics, and the first run through each
 * format's writer. A cold one-study sheet spends more time on that than on its own drawing, and
 * most of it does not depend on the study. The output does not depend on whether it ran.
 */
final class SheetWarmUp {
    private static final Set<OutputFormat> STARTED = java.util.EnumSet.noneOf(OutputFormat.class);

    private SheetWarmUp() {
    }

    /**
     * Starts the warm-up of the formats not yet warmed in this process; returns at once.
     *
     * @param formats the formats the run writes
     */
    static void start(Set<OutputFormat> formats) {
        Set<OutputFormat> chosen = java.util.EnumSet.noneOf(OutputFormat.class);
        synchronized (STARTED) {
            for (OutputFormat f : formats) {
                if (STARTED.add(f)) {
                    chosen.add(f);
                }
            }
        }
        if (chosen.isEmpty()) {
            return;
        }
        Thread t = new Thread(() -> run(chosen), "coordination-warm-up");
        t.setDaemon(true);
        t.setPriority(Thread.MIN_PRIORITY);
        t.start();
    }

    private static void run(Set<OutputFormat> formats) {
        try {
            Drawing.prepare(formats);
        } catch (IOException | RuntimeException e) {
            // only a warm-up: the study's own drawing meets and reports whatever went wrong here
        }
    }
}
