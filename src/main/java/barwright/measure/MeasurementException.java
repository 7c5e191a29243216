package barwright.measure;

/** Readings that cannot give an answer, with the reason in words naming the row or value. */
public final class MeasurementException extends Exception {
    public MeasurementException(String message) {
        super(message);
    }
}
