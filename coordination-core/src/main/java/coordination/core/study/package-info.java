/**
 * Study files: the YAML format of {@code spec/study-format.md} read into a {@link
 * coordination.core.study.Study}, with every problem of a file reported at once as
 * {@code FILE:LINE:COLUMN: path.to.key: what is wrong}, and the evaluation of a study's checks
 * into a {@link coordination.core.study.StudyReport}.
 *
 * <p>The value types are {@link java.io.Serializable} so that a batch engine can move them between JVMs
 * of the same version; their serial forms are not a storage format and may change with any release.
 *
 * @serial exclude
 */
package coordination.core.study;
