package coordination.core.study;

import static org.hamcrest.MatcherAssert.assertThat;
import static org.hamcrest.Matchers.is;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.ObjectInputStream;
import java.io.ObjectOutputStream;
import org.junit.jupiter.api.Test;

class StudyFileExceptionTest {
    @Test
    void theProblemsSurviveSerialisation() throws Exception {
        StudyFileException e = assertThrows(StudyFileException.class,
                () -> StudyReader.parse("bad.yaml", "bad", "format: 1\ntitle: x\nvoltage_kv: lots\n"));
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        try (ObjectOutputStream out = new ObjectOutputStream(bytes)) {
            out.writeObject(e);
        }
        StudyFileException back;
        try (ObjectInputStream in = new ObjectInputStream(new ByteArrayInputStream(bytes.toByteArray()))) {
            back = (StudyFileException) in.readObject();
        }
        assertThat(back.problems(), is(e.problems()));
        assertThat(back.getMessage(), is(e.getMessage()));
    }
}
