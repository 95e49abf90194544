package limen.ui.authoring.parts;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;

import org.eclipse.jface.viewers.ArrayContentProvider;
import org.eclipse.jface.viewers.ColumnLabelProvider;
import org.eclipse.jface.viewers.TableViewer;
import org.eclipse.jface.viewers.TableViewerColumn;
import org.eclipse.jface.wizard.Wizard;
import org.eclipse.jface.wizard.WizardPage;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Text;

import limen.ui.authoring.edit.Templates;
import limen.ui.authoring.edit.Templates.Template;

/** New battery from a template: choose one of the demo lab's batteries, name the new file and its title. */
public final class NewBatteryWizard extends Wizard {

    private final Path folder;
    private final List<Template> templates;
    private Page page;
    private Path created;

    /**
     * @param folder the workspace folder the battery goes to
     * @param templates the templates to offer
     */
    public NewBatteryWizard(Path folder, List<Template> templates) {
        this.folder = folder;
        this.templates = templates;
        setWindowTitle("New battery from template");
    }

    @Override
    public void addPages() {
        page = new Page();
        addPage(page);
    }

    @Override
    public boolean performFinish() {
        try {
            created = Templates.create(page.template(), folder, page.name.getText(), page.title.getText());
            return true;
        } catch (IOException e) {
            page.setErrorMessage("Not created: " + e.getMessage());
            return false;
        }
    }

    /** @return the file made by the last finish, or null */
    public Path created() {
        return created;
    }

    /** The one page: template list, file name and title. */
    final class Page extends WizardPage {
        private TableViewer list;
        private Text name;
        private Text title;

        Page() {
            super("template");
            setTitle("New battery from template");
            setDescription("Start from one of the demo lab's batteries; it is copied into " + folder);
        }

        Template template() {
            return (Template) list.getStructuredSelection().getFirstElement();
        }

        @Override
        public void createControl(Composite parent) {
            Composite c = new Composite(parent, SWT.NONE);
            c.setLayout(new GridLayout(2, false));
            list = new TableViewer(c, SWT.BORDER | SWT.SINGLE | SWT.FULL_SELECTION);
            list.getTable().setHeaderVisible(true);
            GridData data = new GridData(SWT.FILL, SWT.FILL, true, true, 2, 1);
            data.heightHint = 160;
            list.getTable().setLayoutData(data);
            column("Template", 220, Template::name);
            column("Title", 330, Template::title);
            column("Steps", 50, t -> Integer.toString(t.steps()));
            list.setContentProvider(ArrayContentProvider.getInstance());
            list.setInput(templates);
            new Label(c, SWT.NONE).setText("File name");
            name = new Text(c, SWT.BORDER);
            name.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
            new Label(c, SWT.NONE).setText("Title");
            title = new Text(c, SWT.BORDER);
            title.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
            list.addSelectionChangedListener(e -> {
                Template t = template();
                boolean untouched = title.getText().isBlank()
                        || templates.stream().anyMatch(x -> x.title().equals(title.getText()));
                if (t != null && untouched) {
                    title.setText(t.title()); // follow the template until the author types a title
                }
                check();
            });
            name.addListener(SWT.Modify, e -> check());
            if (!templates.isEmpty()) {
                list.getTable().select(0);
                title.setText(templates.get(0).title());
            }
            setControl(c);
            check();
        }

        private void column(String text, int width, java.util.function.Function<Template, String> f) {
            TableViewerColumn col = new TableViewerColumn(list, SWT.NONE);
            col.getColumn().setText(text);
            col.getColumn().setWidth(width);
            col.setLabelProvider(new ColumnLabelProvider() {
                @Override
                public String getText(Object element) {
                    return f.apply((Template) element);
                }
            });
        }

        private void check() {
            String why = templates.isEmpty() ? "no templates: the demo lab's examples folder was not found"
                    : list.getStructuredSelection().isEmpty() ? "choose a template"
                    : Templates.refusal(folder, name.getText());
            setErrorMessage(why == null || name.getText().isBlank() ? null : why);
            setMessage(why != null && name.getText().isBlank() ? "Type a name for the new battery file" : null);
            setPageComplete(why == null);
        }
    }
}
