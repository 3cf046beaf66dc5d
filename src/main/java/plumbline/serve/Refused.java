package plumbline.serve;

/** A request the workbench cannot answer (a refused file name, a missing check, a malformed body): the HTTP status and words for the page. */
final class Refused extends Exception {
    final int status;

    Refused(int status, String message) {
        super(message);
        this.status = status;
    }
}
