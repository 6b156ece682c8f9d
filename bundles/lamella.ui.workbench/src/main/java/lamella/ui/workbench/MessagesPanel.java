package lamella.ui.workbench;

import java.time.ZoneId;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;
import lamella.ui.api.Area;
import lamella.ui.api.Messages;
import lamella.ui.api.PanelView;
import lamella.ui.api.Workbench;
import lamella.ui.api.WorkbenchPanel;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.SashForm;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;
import org.eclipse.swt.widgets.TableItem;
import org.eclipse.swt.widgets.Text;
import org.osgi.service.component.annotations.Component;

/** What happened: a table of time, level and text, newest last; the selected row's cause is shown beside it. */
@Component(service = WorkbenchPanel.class)
public final class MessagesPanel implements WorkbenchPanel {

    static final String ID = "messages";
    private static final DateTimeFormatter TIME = DateTimeFormatter.ofPattern("HH:mm:ss")
            .withZone(ZoneId.systemDefault());

    @Override
    public String id() {
        return ID;
    }

    @Override
    public String title() {
        return "Messages";
    }

    @Override
    public Area preferredArea() {
        return Area.BOTTOM;
    }

    @Override
    public PanelView open(Composite parent, Workbench workbench) {
        SashForm sash = new SashForm(parent, SWT.HORIZONTAL);
        Table table = new Table(sash, SWT.FULL_SELECTION | SWT.SINGLE | SWT.V_SCROLL);
        // A workable size until the first layout: GTK warns about scroll bars drawn at no size.
        table.setSize(400, 160);
        table.setHeaderVisible(true);
        table.setLinesVisible(true);
        column(table, "Time (local)", 110);
        column(table, "Level", 90);
        column(table, "Message", 640);
        Text cause = new Text(sash, SWT.MULTI | SWT.READ_ONLY | SWT.WRAP | SWT.V_SCROLL);
        cause.setMessage("Select a message to see its cause");
        sash.setWeights(68, 32);
        List<Messages.Message> rows = new ArrayList<>();
        Consumer<Messages.Message> add = m -> {
            if (table.isDisposed()) {
                return;
            }
            if (rows.size() >= MessageLog.KEPT) {
                rows.remove(0);
                table.remove(0);
            }
            rows.add(m);
            TableItem item = new TableItem(table, SWT.NONE);
            item.setText(new String[] {TIME.format(m.time()), level(m.level()), m.text()});
            if (m.level() == Messages.Level.ERROR) {
                item.setForeground(table.getDisplay().getSystemColor(SWT.COLOR_DARK_RED));
            }
            table.showItem(item);
        };
        workbench.messages().all().forEach(add);
        workbench.messages().subscribe(add);
        table.addListener(SWT.Selection, e -> {
            int i = table.getSelectionIndex();
            if (i >= 0) {
                Messages.Message m = rows.get(i);
                cause.setText(m.cause() != null ? m.cause() : m.text() + "\n\n(no further cause recorded)");
            }
        });
        return new PanelView() {
            @Override
            public Control control() {
                return sash;
            }

            @Override
            public void close() {
                if (workbench.messages() instanceof MessageLog log) {
                    log.unsubscribe(add);
                }
            }
        };
    }

    private static String level(Messages.Level l) {
        switch (l) {
            case ERROR:
                return "Error";
            case WARNING:
                return "Warning";
            default:
                return "Info";
        }
    }

    private static void column(Table t, String title, int width) {
        TableColumn c = new TableColumn(t, SWT.LEFT);
        c.setText(title);
        c.setWidth(width);
    }
}
