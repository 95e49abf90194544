package limen.ui.analysis.parts;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.Function;

import jakarta.annotation.PostConstruct;
import jakarta.annotation.PreDestroy;
import jakarta.inject.Inject;

import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.e4.core.di.annotations.Optional;
import org.eclipse.e4.core.services.events.IEventBroker;
import org.eclipse.e4.ui.di.Focus;
import org.eclipse.e4.ui.model.application.MApplication;
import org.eclipse.e4.ui.model.application.ui.basic.MPart;
import org.eclipse.jface.viewers.ArrayContentProvider;
import org.eclipse.jface.viewers.ColumnLabelProvider;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.jface.viewers.StructuredSelection;
import org.eclipse.jface.viewers.TableViewer;
import org.eclipse.jface.viewers.TableViewerColumn;
import org.eclipse.jface.viewers.Viewer;
import org.eclipse.jface.viewers.ViewerComparator;
import org.eclipse.jface.viewers.ViewerFilter;
import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.Color;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.DirectoryDialog;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;
import org.eclipse.swt.widgets.Text;

import limen.ui.LimenPreferences;
import limen.ui.StatusLine;
import limen.ui.analysis.AnalysisIds;
import limen.ui.analysis.SessionEntry;

/**
 * The archive browser: the sessions of every open archive folder as one table (participant, battery, start
 * date, status, verified trials, journal integrity), sorted by clicking a column, filtered by text typed
 * above it. Archives are added and removed with the buttons and remembered in the part's persisted state;
 * on a first start the workspace folder the workbench was started on and the archive folder of the
 * preferences are opened (when they exist). Each archive is
 * scanned in a background job. The selection (one or several sessions) is posted on
 * {@link AnalysisIds#SELECTION_TOPIC}.
 */
public final class ArchiveBrowserPart {

    /** The columns: header and text of a session. */
    private static final List<String> HEADERS = List.of("Participant", "Battery", "Date", "Status", "Trials", "Checksum");
    private static final DateTimeFormatter DATE = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm", Locale.ROOT)
            .withZone(ZoneOffset.UTC);

    @Inject
    @Optional
    IEventBroker broker;

    private final Map<Path, List<SessionEntry>> archives = new LinkedHashMap<>();
    private final List<Job> scans = new ArrayList<>();
    private org.eclipse.swt.widgets.List archiveList;
    private Text filter;
    private TableViewer table;
    private Label count;
    private int sortColumn = 2;
    private int sortDirection = 1;
    private Display display;

    @Inject
    @Optional
    MApplication app;

    @Inject
    @Optional
    MPart part;

    /** Persisted-state key of the part: the open archive folders, one absolute path per line. */
    public static final String ARCHIVES_KEY = "limen.ui.analysis.archives";

    @PostConstruct
    public void create(Composite parent) {
        display = parent.getDisplay();
        parent.setLayout(new GridLayout(1, false));
        Composite top = new Composite(parent, SWT.NONE);
        top.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        top.setLayout(new GridLayout(3, false));
        Label archivesLabel = new Label(top, SWT.NONE);
        archivesLabel.setText("Archives:");
        archivesLabel.setLayoutData(new GridData(SWT.LEFT, SWT.TOP, false, false));
        archiveList = new org.eclipse.swt.widgets.List(top, SWT.BORDER | SWT.SINGLE | SWT.V_SCROLL);
        GridData listData = new GridData(SWT.FILL, SWT.FILL, true, false);
        listData.heightHint = 48;
        archiveList.setLayoutData(listData);
        Composite buttons = new Composite(top, SWT.NONE);
        buttons.setLayout(new GridLayout(1, true));
        button(buttons, "Add archive...", "Open another folder of sessions", this::chooseArchive);
        button(buttons, "Remove", "Close the archive selected in the list (nothing is deleted)", () -> {
            int i = archiveList.getSelectionIndex();
            if (i >= 0) {
                removeArchive(new ArrayList<>(archives.keySet()).get(i));
            }
        });

        Composite filterRow = new Composite(parent, SWT.NONE);
        filterRow.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        filterRow.setLayout(new GridLayout(3, false));
        new Label(filterRow, SWT.NONE).setText("Filter:");
        filter = new Text(filterRow, SWT.BORDER | SWT.SEARCH | SWT.ICON_CANCEL);
        filter.setMessage("participant, battery, date, status or checksum");
        filter.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        filter.addModifyListener(e -> refreshTable());
        count = new Label(filterRow, SWT.NONE);
        count.setLayoutData(new GridData(SWT.RIGHT, SWT.CENTER, false, false));

        table = new TableViewer(parent, SWT.BORDER | SWT.MULTI | SWT.FULL_SELECTION | SWT.V_SCROLL | SWT.H_SCROLL);
        Table t = table.getTable();
        t.setHeaderVisible(true);
        t.setLinesVisible(true);
        t.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        int[] widths = {80, 112, 122, 92, 48, 92};
        for (int c = 0; c < HEADERS.size(); c++) {
            final int column = c;
            TableViewerColumn col = new TableViewerColumn(table, SWT.NONE);
            col.getColumn().setText(HEADERS.get(c));
            col.getColumn().setWidth(widths[c]);
            col.getColumn().setAlignment(c == 4 ? SWT.RIGHT : SWT.LEFT);
            col.setLabelProvider(new ColumnLabelProvider() {
                @Override
                public String getText(Object element) {
                    return text((SessionEntry) element, column);
                }

                @Override
                public Color getForeground(Object element) {
                    return column == 5 && !((SessionEntry) element).refittable() ? display.getSystemColor(SWT.COLOR_RED) : null;
                }

                @Override
                public String getToolTipText(Object element) {
                    String p = ((SessionEntry) element).problem();
                    return p.isEmpty() ? ((SessionEntry) element).folder().toString() : p;
                }
            });
            col.getColumn().addListener(SWT.Selection, e -> sortBy(column, column == sortColumn ? -sortDirection : 1));
        }
        org.eclipse.jface.viewers.ColumnViewerToolTipSupport.enableFor(table);
        table.setContentProvider(ArrayContentProvider.getInstance());
        table.setComparator(new ViewerComparator() {
            @Override
            public int compare(Viewer viewer, Object a, Object b) {
                return sortDirection * comparator(sortColumn).compare((SessionEntry) a, (SessionEntry) b);
            }
        });
        table.addFilter(new ViewerFilter() {
            @Override
            public boolean select(Viewer viewer, Object parentElement, Object element) {
                return matches((SessionEntry) element, filter.getText());
            }
        });
        table.addSelectionChangedListener(e -> {
            List<Path> chosen = selection();
            if (app != null) {
                app.getContext().set(AnalysisIds.SELECTION_KEY, chosen);
            }
            if (broker != null) {
                broker.post(AnalysisIds.SELECTION_TOPIC, chosen);
            }
        });
        table.setInput(List.of());
        showSort();

        // the archives open when the workbench last closed, or by default the lab's workspace folder (./limen
        // starts on examples/) and the archive folder of the preferences
        String remembered = part == null ? null : part.getPersistedState().get(ARCHIVES_KEY);
        List<Path> start = new ArrayList<>();
        if (remembered != null) {
            remembered.lines().filter(l -> !l.isBlank()).map(Path::of).forEach(start::add);
        } else {
            LimenPreferences prefs = LimenPreferences.open();
            start.add(prefs.workspaceFolder());
            start.add(prefs.archiveFolder());
        }
        for (Path p : start) {
            if (Files.isDirectory(p)) {
                addArchive(p.toAbsolutePath().normalize());
            }
        }
    }

    private static void button(Composite parent, String text, String tip, Runnable action) {
        Button b = new Button(parent, SWT.PUSH);
        b.setText(text);
        b.setToolTipText(tip);
        b.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        b.addListener(SWT.Selection, e -> action.run());
    }

    private void chooseArchive() {
        DirectoryDialog d = new DirectoryDialog(table.getTable().getShell());
        d.setText("Open an archive folder");
        d.setMessage("A folder holding session folders, at any depth");
        String chosen = d.open();
        if (chosen != null) {
            addArchive(Path.of(chosen));
        }
    }

    /** Opens an archive folder (again: rescans it) and lists its sessions when the scan ends. */
    public Job addArchive(Path archive) {
        Path key = archive.toAbsolutePath().normalize();
        archives.putIfAbsent(key, List.of());
        refreshArchives();
        Job job = Job.create("Reading archive " + key, (IProgressMonitor monitor) -> {
            try {
                List<SessionEntry> found = SessionEntry.scan(key);
                display.asyncExec(() -> scanned(key, found, null));
            } catch (IOException | RuntimeException e) {
                display.asyncExec(() -> scanned(key, List.of(), e.getMessage()));
            }
            return Status.OK_STATUS;
        });
        job.setSystem(false);
        synchronized (scans) {
            scans.add(job);
        }
        job.addJobChangeListener(new org.eclipse.core.runtime.jobs.JobChangeAdapter() {
            @Override
            public void done(org.eclipse.core.runtime.jobs.IJobChangeEvent event) {
                synchronized (scans) {
                    scans.remove(job);
                }
            }
        });
        job.schedule();
        return job;
    }

    private void scanned(Path archive, List<SessionEntry> found, String problem) {
        if (table.getTable().isDisposed() || !archives.containsKey(archive)) {
            return;
        }
        archives.put(archive, List.copyOf(found));
        refreshArchives();
        refreshTable();
        if (problem != null) {
            status("Archive " + archive + ": " + problem);
        }
    }

    /** Closes an archive (its files stay as they are). */
    public void removeArchive(Path archive) {
        archives.remove(archive.toAbsolutePath().normalize());
        refreshArchives();
        refreshTable();
    }

    /** @return the open archive folders, in the order they were opened */
    public List<Path> archives() {
        return List.copyOf(archives.keySet());
    }

    /** @return whether an archive is still being read */
    public boolean scanning() {
        synchronized (scans) {
            return !scans.isEmpty();
        }
    }

    private void refreshArchives() {
        if (part != null) {
            part.getPersistedState().put(ARCHIVES_KEY, String.join("\n", archives.keySet().stream().map(Path::toString).toList()));
        }
        archiveList.removeAll();
        for (Map.Entry<Path, List<SessionEntry>> e : archives.entrySet()) {
            archiveList.add(e.getKey() + "  (" + e.getValue().size() + " sessions)");
        }
    }

    private void refreshTable() {
        List<SessionEntry> all = new ArrayList<>();
        archives.values().forEach(all::addAll);
        table.setInput(all);
        count.setText(visible().size() + " of " + all.size() + " sessions");
        count.getParent().layout();
    }

    /** Sorts by a column (0 participant ... 5 checksum), direction 1 ascending, -1 descending. */
    public void sortBy(int column, int direction) {
        sortColumn = column;
        sortDirection = direction >= 0 ? 1 : -1;
        showSort();
        table.refresh();
    }

    private void showSort() {
        Table t = table.getTable();
        TableColumn c = t.getColumn(sortColumn);
        t.setSortColumn(c);
        t.setSortDirection(sortDirection > 0 ? SWT.UP : SWT.DOWN);
    }

    /** Shows only the sessions whose columns contain the text (any case). */
    public void setFilter(String text) {
        filter.setText(text);
    }

    /** @return the sessions as the table shows them (filtered, sorted) */
    public List<SessionEntry> visible() {
        List<SessionEntry> out = new ArrayList<>();
        for (int i = 0; i < table.getTable().getItemCount(); i++) {
            out.add((SessionEntry) table.getElementAt(i));
        }
        return out;
    }

    /** Selects these session folders (those shown) and posts the selection. */
    public void select(List<Path> folders) {
        List<SessionEntry> chosen = visible().stream().filter(e -> folders.contains(e.folder())).toList();
        table.setSelection(new StructuredSelection(chosen), true);
    }

    /** @return the selected session folders */
    public List<Path> selection() {
        IStructuredSelection s = table.getStructuredSelection();
        List<Path> out = new ArrayList<>();
        for (Object o : s.toList()) {
            out.add(((SessionEntry) o).folder());
        }
        return out;
    }

    static String text(SessionEntry e, int column) {
        switch (column) {
        case 0:
            return e.participant();
        case 1:
            return e.battery();
        case 2:
            return e.started() == null ? "" : DATE.format(e.started());
        case 3:
            return e.status();
        case 4:
            return Integer.toString(e.trials());
        default:
            return e.integrity();
        }
    }

    private static Comparator<SessionEntry> comparator(int column) {
        Function<SessionEntry, String> byText = e -> text(e, column).toLowerCase(Locale.ROOT);
        Comparator<SessionEntry> c = switch (column) {
        case 2 -> Comparator.comparing(e -> e.started() == null ? java.time.Instant.EPOCH : e.started());
        case 4 -> Comparator.comparingInt(SessionEntry::trials);
        default -> Comparator.comparing(byText);
        };
        return c.thenComparing(e -> e.folder().toString());
    }

    static boolean matches(SessionEntry e, String text) {
        String t = text == null ? "" : text.trim().toLowerCase(Locale.ROOT);
        if (t.isEmpty()) {
            return true;
        }
        for (int c = 0; c < HEADERS.size(); c++) {
            if (text(e, c).toLowerCase(Locale.ROOT).contains(t)) {
                return true;
            }
        }
        return e.name().toLowerCase(Locale.ROOT).contains(t);
    }

    private void status(String message) {
        if (broker != null) {
            broker.post(StatusLine.TOPIC, message);
        }
    }

    @Focus
    public void focus() {
        table.getTable().setFocus();
    }

    @PreDestroy
    public void dispose() {
        synchronized (scans) {
            scans.forEach(Job::cancel);
        }
    }
}
