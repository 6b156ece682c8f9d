package lamella.ui.workbench;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.function.Consumer;
import lamella.ui.api.Messages;
import org.eclipse.swt.widgets.Display;

/**
 * The window's messages. Any thread may add one; listeners hear of it on the UI thread. The log is bounded, so that
 * a plug-in that fails in a loop cannot fill the memory.
 */
final class MessageLog implements Messages {

    static final int KEPT = 5000;

    private final List<Message> messages = new ArrayList<>();
    private final List<Consumer<Message>> listeners = new CopyOnWriteArrayList<>();
    private volatile Display display;

    /** Listeners are called on this display's thread from now on. */
    void deliverOn(Display display) {
        this.display = display;
    }

    @Override
    public void info(String text) {
        add(Level.INFO, text, null);
    }

    @Override
    public void warning(String text) {
        add(Level.WARNING, text, null);
    }

    @Override
    public void error(String text, Throwable cause) {
        add(Level.ERROR, text, cause == null ? null : describe(cause));
    }

    @Override
    public synchronized List<Message> all() {
        return List.copyOf(messages);
    }

    @Override
    public void subscribe(Consumer<Message> listener) {
        listeners.add(listener);
    }

    void unsubscribe(Consumer<Message> listener) {
        listeners.remove(listener);
    }

    private void add(Level level, String text, String cause) {
        Message m = new Message(Instant.now(), level, text, cause);
        synchronized (this) {
            messages.add(m);
            if (messages.size() > KEPT) {
                messages.remove(0);
            }
        }
        Display d = display;
        if (d == null || d.isDisposed()) {
            return;
        }
        Runnable tell = () -> listeners.forEach(l -> l.accept(m));
        if (d.getThread() == Thread.currentThread()) {
            tell.run();
        } else {
            d.asyncExec(tell);
        }
    }

    /** The cause's chain of messages first, which is what a user reads; the stack trace after, for a report. */
    static String describe(Throwable cause) {
        StringBuilder sb = new StringBuilder();
        for (Throwable t = cause; t != null; t = t.getCause() == t ? null : t.getCause()) {
            sb.append(t.getMessage() != null ? t.getMessage() : t.getClass().getSimpleName()).append('\n');
        }
        StringWriter trace = new StringWriter();
        cause.printStackTrace(new PrintWriter(trace));
        return sb.append("\nDetails for a bug report:\n").append(trace).toString();
    }
}
