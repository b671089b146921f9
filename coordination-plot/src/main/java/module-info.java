/**
 * Time-current charts, coordination sheets in SVG, PNG and PDF, and the command line. The charts
 * are XChart charts and the sheets paint on Java 2D, so both are part of this module's API;
 * picocli is read only when present, so the library's users need not carry it.
 */
@SuppressWarnings({"requires-automatic", "requires-transitive-automatic"})
module coordination.plot {
    requires transitive coordination.core;
    requires transitive java.desktop;
    requires transitive xchart;
    requires org.apache.xmlgraphics.batik.svggen;
    requires java.xml;
    requires de.rototor.pdfbox.graphics2d;
    requires org.apache.pdfbox;
    requires org.apache.fontbox;
    requires org.apache.pdfbox.io;
    requires pngencoder;
    requires static info.picocli;

    exports coordination.plot.chart;
    exports coordination.plot.cli;
    exports coordination.plot.sheet;

    opens coordination.plot.cli to info.picocli;
    // the shipped fonts are read as resources of this module
    opens coordination.plot.fonts;
}
