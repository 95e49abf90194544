package limen.ui.parts;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.ZoneId;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.stream.Stream;

import jakarta.annotation.PostConstruct;
import jakarta.inject.Inject;

import org.eclipse.e4.core.di.annotations.Optional;
import org.eclipse.e4.core.services.events.IEventBroker;
import org.eclipse.e4.ui.di.Focus;
import org.eclipse.e4.ui.di.UIEventTopic;
import org.eclipse.jface.viewers.ArrayContentProvider;
import org.eclipse.jface.viewers.ColumnLabelProvider;
import org.eclipse.jface.viewers.TableViewer;
import org.eclipse.jface.viewers.TableViewerColumn;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;

import limen.ui.LimenPreferences;
import limen.ui.StatusLine;

/** Lists the batteries and calibrations of the lab's workspace folder (and its subfolders). */
public final class WorkspacePart {

    /** Event topic that makes the part reread its folder. */
    public static final String REFRESH_TOPIC = "limen/workspace/refresh";

    /** One file of the workspace. */
    public record Entry(Path path, String kind, long sizeBytes, long modifiedMillis) {
        public String name() {
            return path.getFileName().toString();
        }
    }

    private static final DateTimeFormatter WHEN = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm")
            .withZone(ZoneId.systemDefault());

    @Inject
    @Optional
    IEventBroker broker;

    private Label folderLabel;
    private TableViewer viewer;
    private Path folder;

    @PostConstruct
    public void create(Composite parent) {
        parent.setLayout(new GridLayout(1, false));
        folderLabel = new Label(parent, SWT.WRAP);
        folderLabel.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        viewer = new TableViewer(parent, SWT.BORDER | SWT.FULL_SELECTION | SWT.V_SCROLL | SWT.H_SCROLL);
        viewer.getTable().setHeaderVisible(true);
        viewer.getTable().setLinesVisible(true);
        viewer.getTable().setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        column("File", 260, e -> folder != null ? folder.relativize(e.path()).toString() : e.name());
        column("Kind", 100, Entry::kind);
        column("Modified", 140, e -> WHEN.format(java.time.Instant.ofEpochMilli(e.modifiedMillis())));
        column("Size", 80, e -> String.format(Locale.ROOT, "%.1f kB", e.sizeBytes() / 1024.0));
        viewer.setContentProvider(ArrayContentProvider.getInstance());
        refresh();
    }

    private void column(String title, int width, java.util.function.Function<Entry, String> text) {
        TableViewerColumn c = new TableViewerColumn(viewer, SWT.NONE);
        c.getColumn().setText(title);
        c.getColumn().setWidth(width);
        c.setLabelProvider(new ColumnLabelProvider() {
            @Override
            public String getText(Object element) {
                return text.apply((Entry) element);
            }
        });
    }

    @Inject
    @Optional
    void onRefresh(@UIEventTopic(REFRESH_TOPIC) Object why) {
        if (viewer != null && !viewer.getTable().isDisposed()) {
            refresh();
        }
    }

    /** Rereads the workspace folder named in the preferences. */
    public void refresh() {
        folder = LimenPreferences.open().workspaceFolder().toAbsolutePath().normalize();
        List<Entry> entries;
        String problem = null;
        try {
            entries = scan(folder);
        } catch (IOException e) {
            entries = List.of();
            problem = "cannot read " + folder + ": " + e.getMessage();
        }
        viewer.setInput(entries);
        folderLabel.setText(problem != null ? problem : "Workspace: " + folder);
        folderLabel.getParent().layout(true);
        if (broker != null) {
            broker.post(StatusLine.TOPIC, problem != null ? problem
                    : entries.size() + " files in " + folder.getFileName());
        }
    }

    /** The workspace files shown, sorted by path (for tests). */
    @SuppressWarnings("unchecked")
    public List<Entry> entries() {
        return (List<Entry>) viewer.getInput();
    }

    /** Batteries and calibrations under a folder, sorted by path; a missing folder is empty. */
    public static List<Entry> scan(Path folder) throws IOException {
        if (!Files.isDirectory(folder)) {
            return List.of();
        }
        List<Entry> out = new ArrayList<>();
        try (Stream<Path> files = Files.walk(folder, 4)) {
            for (Path p : (Iterable<Path>) files::iterator) {
                String kind = kindOf(p);
                if (kind != null && Files.isRegularFile(p)) {
                    out.add(new Entry(p, kind, Files.size(p), Files.getLastModifiedTime(p).toMillis()));
                }
            }
        }
        out.sort(Comparator.comparing(Entry::path));
        return out;
    }

    private static String kindOf(Path p) {
        String name = p.getFileName().toString();
        if (name.endsWith(".battery")) {
            return "battery";
        }
        if (name.endsWith(".calibration")) {
            return "calibration";
        }
        return null;
    }

    @Focus
    public void focus() {
        viewer.getTable().setFocus();
    }
}
