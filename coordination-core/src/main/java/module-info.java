/**
 * Device curves, cable thermal limits, the margin and grading engine, design aids and study files.
 * The {@code internal} package is not exported; the Hamcrest matchers need Hamcrest on the user's
 * test path, which is why it is read only when present.
 */
@SuppressWarnings("requires-automatic")
module coordination.core {
    requires com.fasterxml.jackson.core;
    requires com.fasterxml.jackson.dataformat.yaml;
    requires org.yaml.snakeyaml;
    requires commons.math3;
    requires static org.hamcrest;

    exports coordination.core;
    exports coordination.core.cable;
    exports coordination.core.curve;
    exports coordination.core.design;
    exports coordination.core.margin;
    exports coordination.core.matchers;
    exports coordination.core.network;
    exports coordination.core.study;
}
