package coordination.samples.spark;

import java.io.Serial;
import java.io.Serializable;

/** One row of the summary table: a study file and its verdict (a Java bean, for Spark's bean encoder). */
public final class Outcome implements Serializable {
    @Serial
    private static final long serialVersionUID = 1L;

    private String file;
    private String study;
    private String verdict;
    private int checks;
    private int failing;
    private int errors;

    /** An empty row, for the encoder. */
    public Outcome() {
    }

    /** @return the file's path below the input folder */
    public String getFile() {
        return file;
    }

    /** @param file the file's path below the input folder */
    public void setFile(String file) {
        this.file = file;
    }

    /** @return the study's name: the file name without its extension */
    public String getStudy() {
        return study;
    }

    /** @param study the study's name */
    public void setStudy(String study) {
        this.study = study;
    }

    /** @return {@code pass}, {@code fail} or {@code not-read} */
    public String getVerdict() {
        return verdict;
    }

    /** @param verdict {@code pass}, {@code fail} or {@code not-read} */
    public void setVerdict(String verdict) {
        this.verdict = verdict;
    }

    /** @return the number of checks run */
    public int getChecks() {
        return checks;
    }

    /** @param checks the number of checks run */
    public void setChecks(int checks) {
        this.checks = checks;
    }

    /** @return the number of checks that failed */
    public int getFailing() {
        return failing;
    }

    /** @param failing the number of checks that failed */
    public void setFailing(int failing) {
        this.failing = failing;
    }

    /** @return the number of error lines of a study that could not be read */
    public int getErrors() {
        return errors;
    }

    /** @param errors the number of error lines */
    public void setErrors(int errors) {
        this.errors = errors;
    }
}
