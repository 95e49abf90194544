package limen.ui.authoring.edit;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;
import java.util.stream.Collectors;

import org.eclipse.emf.ecore.EAttribute;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EStructuralFeature;
import org.eclipse.jface.resource.JFaceResources;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.ScrolledComposite;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Label;

import limen.model.Battery;
import limen.model.Break;
import limen.model.ContributedProcedure;
import limen.model.ForcedChoiceTask;
import limen.model.LimenPackage.Literals;
import limen.model.RelativeLevel;
import limen.model.Setting;
import limen.model.SettingsGroup;
import limen.model.Step;
import limen.model.Track;
import limen.model.YesNoTask;
import limen.model.validation.Problem;

/**
 * The settings of the element selected in the tree, as labelled fields with units, in sections: a battery's
 * own settings; a step's settings with its task, stimulus (standard level, masker) and varied quantity; a
 * track's name with its procedure and stopping rule; a break's settings. Problems that concern the shown
 * elements but no single field are listed at the top.
 */
public final class SettingsForm {

    private final ScrolledComposite scroller;
    private final Composite body;
    private final BatteryDocument document;
    private final Consumer<String> status;
    private final List<Field> fields = new ArrayList<>();
    private final List<EObject> owners = new ArrayList<>();
    private Label messages;
    private EObject shown;
    private List<Object> signature = List.of();
    private List<Problem> problems = List.of();

    /**
     * @param status receives one-line messages for the status line (what was set, what was refused)
     */
    public SettingsForm(Composite parent, BatteryDocument document, Consumer<String> status) {
        this.document = document;
        this.status = status;
        scroller = new ScrolledComposite(parent, SWT.V_SCROLL | SWT.H_SCROLL);
        scroller.setExpandHorizontal(true);
        scroller.setExpandVertical(true);
        body = new Composite(scroller, SWT.NONE);
        body.setLayout(new GridLayout(3, false));
        scroller.setContent(body);
        scroller.addListener(SWT.Resize, e -> relayout());
    }

    /** @return the form's outer control */
    public Control control() {
        return scroller;
    }

    /** @return the element shown, or null */
    public EObject shown() {
        return shown;
    }

    /** @return the fields now shown */
    public List<Field> fields() {
        return List.copyOf(fields);
    }

    /**
     * @return the field editing a feature of an element, or null when it is not shown
     */
    public Field field(EObject owner, EStructuralFeature feature) {
        for (Field f : fields) {
            if (f.owner() == owner && f.feature() == feature) {
                return f;
            }
        }
        return null;
    }

    /** Shows the settings of a battery, step, track or break (null shows nothing). */
    public void show(EObject element) {
        shown = element;
        rebuild();
    }

    private void rebuild() {
        for (Control c : body.getChildren()) {
            c.dispose();
        }
        fields.clear();
        owners.clear();
        List<Section> sections = shown == null ? List.of() : sectionsOf(shown);
        signature = signatureOf(sections);
        messages = new Label(body, SWT.WRAP);
        GridData wide = new GridData(SWT.FILL, SWT.TOP, true, false, 3, 1);
        wide.widthHint = 380;
        messages.setLayoutData(wide);
        if (shown == null) {
            messages.setText("Select a step, track or break in the tree to edit its settings.");
        }
        for (Section s : sections) {
            Label title = new Label(body, SWT.NONE);
            title.setText(s.title());
            title.setFont(JFaceResources.getBannerFont());
            GridData titleData = new GridData(SWT.FILL, SWT.TOP, true, false, 3, 1);
            titleData.verticalIndent = 8;
            title.setLayoutData(titleData);
            owners.add(s.owner());
            for (EStructuralFeature f : s.features()) {
                fields.add(new Field(body, document, s.owner(), f, status));
            }
        }
        showProblems(problems);
        relayout();
    }

    private void relayout() {
        body.layout(true, true);
        scroller.setMinSize(body.computeSize(Math.max(300, scroller.getClientArea().width), SWT.DEFAULT));
    }

    /** Rereads the model after a change; rebuilds the form when the shown elements changed shape. */
    public void refresh() {
        if (shown != null && shown.eResource() == null && !(shown instanceof Battery)) {
            show(null); // the element was deleted (or the change that made it undone)
            return;
        }
        if (shown != null && !signatureOf(sectionsOf(shown)).equals(signature)) {
            rebuild();
            return;
        }
        for (Field f : fields) {
            f.refresh();
        }
        body.layout(true, true);
    }

    /** Shows the problems that concern the shown elements: at their fields, or at the top of the form. */
    public void showProblems(List<Problem> all) {
        problems = List.copyOf(all);
        for (Field f : fields) {
            f.showProblems(all.stream().filter(p -> p.object() == f.owner() && p.feature() == f.feature()).toList());
        }
        if (shown == null || messages == null || messages.isDisposed()) {
            return;
        }
        List<Problem> general = all.stream()
                .filter(p -> owners.contains(p.object()) && field(p.object(), p.feature()) == null).toList();
        messages.setText(general.stream().map(p -> p.severity().label() + " " + p.code().code() + ": " + p.message())
                .collect(Collectors.joining("\n")));
        messages.setForeground(general.isEmpty() ? null : body.getDisplay().getSystemColor(SWT.COLOR_DARK_RED));
        relayout();
    }

    /** One titled group of fields of one element. */
    private record Section(String title, EObject owner, List<EStructuralFeature> features) {
    }

    private static List<Section> sectionsOf(EObject e) {
        List<Section> out = new ArrayList<>();
        if (e instanceof Battery b) {
            add(out, "Battery", b);
        } else if (e instanceof Break b) {
            add(out, "Break", b);
        } else if (e instanceof Step s) {
            add(out, "Step", s);
            String task = s.getTask() instanceof ForcedChoiceTask fc ? "Task: " + fc.getIntervalCount()
                    + "-interval forced choice" : s.getTask() instanceof YesNoTask ? "Task: yes/no" : "Task";
            add(out, task, s.getTask());
            if (s.getStimulus() != null) {
                add(out, "Stimulus", s.getStimulus());
                add(out, s.getStimulus().getStandardLevel() instanceof RelativeLevel ? "Standard level (relative)"
                        : "Standard level", s.getStimulus().getStandardLevel());
                if (s.getStimulus().getMasker() != null) {
                    add(out, "Masker", s.getStimulus().getMasker());
                    add(out, "Masker level", s.getStimulus().getMasker().getLevel());
                }
                for (SettingsGroup g : s.getStimulus().getContributions()) {
                    addGroup(out, "Stimulus design", g);
                }
            }
            add(out, "Varied quantity", s.getVariedQuantity());
        } else if (e instanceof Track t) {
            add(out, "Track", t);
            add(out, "Procedure: " + ElementLabels.procedure(t.getProcedure()), t.getProcedure());
            if (t.getProcedure() instanceof ContributedProcedure c) {
                addGroup(out, "Procedure settings", c.getSettings());
            }
            add(out, "Stopping rule", t.getStoppingRule());
        }
        return out;
    }

    private static void add(List<Section> out, String title, EObject owner) {
        if (owner == null) {
            return;
        }
        List<EStructuralFeature> features = new ArrayList<>();
        for (EAttribute a : owner.eClass().getEAllAttributes()) {
            if (a.isChangeable() && !a.isDerived() && !a.isTransient() && a != Literals.LIMEN_DOCUMENT__SCHEMA_VERSION) {
                features.add(a);
            }
        }
        if (owner instanceof RelativeLevel) {
            features.add(0, Literals.RELATIVE_LEVEL__REFERENCE);
        }
        out.add(new Section(title, owner, features));
    }

    /**
     * A contributed procedure's or stimulus design's generic settings: the group (its contributor id) and one
     * section per entry (name, value, type), edited like any other field; the contributor judges the values
     * through the validator (LM0805, LM0806).
     */
    private static void addGroup(List<Section> out, String title, SettingsGroup group) {
        if (group == null) {
            return;
        }
        add(out, title, group);
        for (Setting setting : group.getEntries()) {
            add(out, "Setting", setting);
        }
    }

    private static List<Object> signatureOf(List<Section> sections) {
        List<Object> sig = new ArrayList<>();
        for (Section s : sections) {
            sig.add(s.title());
            sig.add(s.owner());
        }
        return sig;
    }
}
