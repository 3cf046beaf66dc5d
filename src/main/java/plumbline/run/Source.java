package plumbline.run;

import java.nio.file.Path;
import plumbline.io.ModelReader;
import plumbline.model.InputException;

/**
 * One input file as a run reads it: the name it is reported under (as given on the command
 * line, or as the workbench's editor names it) and its bytes.
 */
public record Source(String name, byte[] bytes) {

    public Source {
        bytes = bytes.clone();
    }

    /** A file read from disk, refused with a message when it is missing or too large. */
    public static Source of(Path path) throws InputException {
        return new Source(path.toString(), ModelReader.readBytes(path));
    }

    @Override
    public byte[] bytes() {
        return bytes.clone();
    }
}
