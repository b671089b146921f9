package coordination.plot.sheet;

/** File formats of charts and sheets. */
public enum OutputFormat {
    /** Scalable vector graphics. */
    SVG("svg"),
    /** Portable network graphics at a chosen resolution. */
    PNG("png"),
    /** Portable document format, one page. */
    PDF("pdf");

    private final String extension;

    OutputFormat(String extension) {
        this.extension = extension;
    }

    /** @return the file extension without a dot */
    public String extension() {
        return extension;
    }

    /**
     * Finds a format by name.
     *
     * @param name {@code svg}, {@code png} or {@code pdf}, as written here
     * @return the format
     * @throws IllegalArgumentException for any other name
     */
    public static OutputFormat parse(String name) {
        for (OutputFormat f : values()) {
            if (f.extension.equals(name)) {
                return f;
            }
        }
        throw new IllegalArgumentException("format: found '" + name + "' - must be svg, png or pdf");
    }
}
