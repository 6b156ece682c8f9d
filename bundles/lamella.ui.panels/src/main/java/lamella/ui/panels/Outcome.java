package lamella.ui.panels;

/**
 * The result of background work, or what kept it from one: a panel shows the problem inline beside its plot
 * rather than only in the Messages panel.
 */
record Outcome<T>(T value, String problem) {

    static <T> Outcome<T> of(T value) {
        return new Outcome<>(value, null);
    }

    static <T> Outcome<T> failed(String problem) {
        return new Outcome<>(null, problem);
    }

    boolean ok() {
        return problem == null;
    }
}
