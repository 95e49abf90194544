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
        box.setLayout(layout);
        message = new Label(box, SWT.NONE);
        message.setText("Ready");
        message.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        Label notice = new Label(box, SWT.NONE);
        notice.setText("Research use only: not a clinical audiometer");
        notice.setToolTipText(limen.core.About.RESEARCH_CAUTION);
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
