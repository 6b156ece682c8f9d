package lamella.cli;

import java.io.PrintStream;
import lamella.api.fit.Progress;

/**
 * Progress on standard error: a line rewritten in place on a terminal, otherwise one line per tenth of the work so
 * that logs stay short. Never cancels (a headless run is cancelled by ending the process).
 */
final class ProgressLine implements Progress {

    private final PrintStream err;
    private final boolean terminal = System.console() != null;
    private String lastStage = "";
    private int lastTenth = -1;

    ProgressLine(PrintStream err) {
        this.err = err;
    }

    @Override
    public synchronized void update(String stage, int done, int total) {
        if (total <= 1) {
            return;
        }
        int tenth = 10 * done / total;
        if (terminal) {
            int width = 30;
            int filled = width * done / total;
            err.print("\r" + stage + " [" + "#".repeat(filled) + " ".repeat(width - filled) + "] " + done + "/" + total
                    + (done == total ? "\n" : ""));
            err.flush();
        } else if (!stage.equals(lastStage) || tenth != lastTenth) {
            err.println(stage + ": " + done + "/" + total);
        }
        lastStage = stage;
        lastTenth = tenth;
    }

    @Override
    public boolean cancelled() {
        return false;
    }
}
