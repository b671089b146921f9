/**
 * Study files: the YAML format of {@code spec/study-format.md} read into a {@link
 * coordination.core.study.Study}, with every problem of a file reported at once as
 * {@code FILE:LINE:COLUMN: path.to.key: what is wrong}, and the evaluation of a study's checks
 * into a {@link coordination.core.study.StudyReport}.
 */
package coordination.core.study;
