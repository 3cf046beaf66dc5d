package plumbline.units;

/** A unit or quantity string that cannot be read; the message says what was expected. */
public final class UnitParseException extends Exception {
    public UnitParseException(String message) {
        super(message);
    }
}
