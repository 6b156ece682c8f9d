package lamella.ui.api;

/** Background work under way. */
public interface Task {

    /** Asks the work to stop at its next progress check. */
    void cancel();

    boolean done();
}
