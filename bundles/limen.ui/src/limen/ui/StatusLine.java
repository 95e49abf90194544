package limen.ui;

import jakarta.annotation.PostConstruct;
import jakarta.inject.Inject;

import org.eclipse.e4.core.di.annotations.Optional;
import org.eclipse.e4.ui.di.UIEventTopic;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;

/**
 * The status line at the bottom of the main window. Any part posts a message with
 * {@code eventBroker.post(StatusLine.TOPIC, "text")}; the research-use notice stays visible on the right.
 */
public final class StatusLine {

    /** Event topic whose {@code String} payload replaces the message. */
    public static final String TOPIC = "limen/status";

    private Label message;

    @PostConstruct
    public void create(Composite parent) {
        Composite box = new Composite(parent, SWT.NONE);
        GridLayout layout = new GridLayout(2, false);
        layout.marginHeight = 2;
        layout.marginWidth = 6;
        box.setLayout(layout);
        message = new Label(box, SWT.NONE);
        message.setText("Ready");
        GridData grow = new GridData(SWT.FILL, SWT.CENTER, true, false);
        grow.widthHint = 700;
        message.setLayoutData(grow);
        Label notice = new Label(box, SWT.NONE);
        notice.setText("Research use only: not a clinical audiometer");
        notice.setToolTipText(limen.core.About.RESEARCH_CAUTION);
        box.pack();
        // The window's trim layout runs before GTK has placed the menu bar, which leaves the bottom trim
        // below the client area; lay the window out again once it is showing.
        box.getDisplay().asyncExec(() -> {
            if (!box.isDisposed()) {
                box.getShell().layout(true, true);
            }
        });
    }

    @Inject
    @Optional
    void show(@UIEventTopic(TOPIC) String text) {
        if (message != null && !message.isDisposed()) {
            message.setText(text);
            message.getParent().layout(true);
        }
    }

    /** The message now shown (for tests). */
    public String text() {
        return message.getText();
    }
}
