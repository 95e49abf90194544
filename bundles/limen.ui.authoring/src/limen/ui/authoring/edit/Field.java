package limen.ui.authoring.edit;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.function.Consumer;
import java.util.stream.Collectors;

import org.eclipse.emf.common.command.CommandWrapper;
import org.eclipse.emf.common.util.Enumerator;
import org.eclipse.emf.ecore.EAttribute;
import org.eclipse.emf.ecore.EEnum;
import org.eclipse.emf.ecore.EEnumLiteral;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EStructuralFeature;
import org.eclipse.emf.edit.command.SetCommand;
import org.eclipse.jface.fieldassist.ControlDecoration;
import org.eclipse.jface.fieldassist.FieldDecorationRegistry;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Text;

import limen.model.Battery;
import limen.model.Step;
import limen.model.validation.Problem;
import limen.model.validation.Severity;

/**
 * One setting in the form: a text, choice or switch bound to a feature of a model element. Typing is held to
 * the field's {@link Domain} (characters that cannot belong to a number are not accepted; values out of range
 * are refused with the reason shown at the field and never reach the model). Accepted values are written as
 * one EMF {@link SetCommand} each (so every change can be undone) when the author presses Enter, leaves the
 * field, or stops typing for {@value #IDLE_COMMIT_MILLIS} ms.
 * <p>
 * The decoration at the field shows the refusal, else the validator's problems about this very setting.
 */
public final class Field {

    /** Pause in typing after which an accepted value is applied. */
    public static final int IDLE_COMMIT_MILLIS = 700;

    private enum Kind {
        TEXT, NUMBER, NUMBER_LIST, CHOICE, SWITCH, REFERENCE
    }

    private final BatteryDocument document;
    private final EObject owner;
    private final EStructuralFeature feature;
    private final Kind kind;
    private final Control control;
    private final Label unitLabel;
    private final ControlDecoration decoration;
    private final Consumer<String> status;
    private final Runnable idleCommit = this::commit;
    private FieldSpec spec;
    private String refusal;
    private List<Problem> problems = List.of();
    private boolean updating;
    private List<Step> referenceChoices = List.of();

    Field(Composite grid, BatteryDocument document, EObject owner, EStructuralFeature feature, Consumer<String> status) {
        this.document = document;
        this.owner = owner;
        this.feature = feature;
        this.status = status;
        this.spec = FieldSpec.of(owner, feature);
        this.kind = kindOf(feature);
        Label label = new Label(grid, SWT.NONE);
        label.setText(spec.label());
        label.setToolTipText(spec.help());
        label.setLayoutData(new GridData(SWT.LEFT, kind == Kind.TEXT && multiLine() ? SWT.TOP : SWT.CENTER, false,
                false));
        control = create(grid);
        control.setToolTipText(spec.help());
        GridData data = new GridData(SWT.FILL, SWT.CENTER, true, false);
        data.horizontalIndent = 10;
        data.widthHint = 180;
        if (kind == Kind.TEXT && multiLine()) {
            data.heightHint = 48;
        }
        control.setLayoutData(data);
        unitLabel = new Label(grid, SWT.NONE);
        unitLabel.setText(spec.unit());
        unitLabel.setLayoutData(new GridData(SWT.LEFT, SWT.CENTER, false, false));
        decoration = new ControlDecoration(control, SWT.LEFT | SWT.CENTER);
        decoration.setMarginWidth(1);
        decoration.hide();
        refresh();
    }

    private static Kind kindOf(EStructuralFeature feature) {
        if (!(feature instanceof EAttribute a)) {
            return Kind.REFERENCE;
        }
        if (a.getEAttributeType() instanceof EEnum) {
            return Kind.CHOICE;
        }
        Class<?> type = a.getEAttributeType().getInstanceClass();
        if (type == boolean.class || type == Boolean.class) {
            return Kind.SWITCH;
        }
        if (type == String.class) {
            return Kind.TEXT;
        }
        return a.isMany() ? Kind.NUMBER_LIST : Kind.NUMBER;
    }

    private boolean multiLine() {
        String n = feature.getName();
        return n.equals("notes") || n.equals("message");
    }

    private Control create(Composite grid) {
        switch (kind) {
            case CHOICE, REFERENCE -> {
                Combo combo = new Combo(grid, SWT.READ_ONLY | SWT.DROP_DOWN);
                combo.addListener(SWT.Selection, e -> {
                    if (!updating) {
                        commit();
                    }
                });
                return combo;
            }
            case SWITCH -> {
                Button check = new Button(grid, SWT.CHECK);
                check.addListener(SWT.Selection, e -> {
                    if (!updating) {
                        commit();
                    }
                });
                return check;
            }
            default -> {
                int style = SWT.BORDER | (kind == Kind.TEXT && multiLine() ? SWT.MULTI | SWT.WRAP | SWT.V_SCROLL
                        : SWT.SINGLE);
                Text text = new Text(grid, style);
                if (feature.isUnsettable()) {
                    text.setMessage("not set");
                }
                if (kind == Kind.NUMBER || kind == Kind.NUMBER_LIST) {
                    text.addListener(SWT.Verify, e -> {
                        for (char c : e.text.toCharArray()) {
                            if (!spec.domain().mayContain(c) && !(kind == Kind.NUMBER_LIST && (c == ',' || c == ' '))) {
                                e.doit = false;
                                status.accept(spec.label() + ": '" + c + "' cannot be part of "
                                        + (spec.domain().integral() ? "a whole number" : "a number"));
                                return;
                            }
                        }
                    });
                }
                text.addListener(SWT.Modify, e -> {
                    if (updating) {
                        return;
                    }
                    checkInput();
                    text.getDisplay().timerExec(IDLE_COMMIT_MILLIS, idleCommit);
                });
                text.addListener(SWT.DefaultSelection, e -> commit());
                text.addListener(SWT.FocusOut, e -> {
                    commit();
                    if (refusal != null) {
                        status.accept(spec.label() + ": not applied (" + refusal + "); back to the saved value");
                        refusal = null;
                        refresh();
                    }
                });
                text.addListener(SWT.Dispose, e -> text.getDisplay().timerExec(-1, idleCommit));
                return text;
            }
        }
    }

    /** @return the element whose feature this field edits */
    public EObject owner() {
        return owner;
    }

    /** @return the edited feature */
    public EStructuralFeature feature() {
        return feature;
    }

    /** @return the widget */
    public Control control() {
        return control;
    }

    /** @return the unit shown after the field */
    public String unit() {
        return unitLabel.getText();
    }

    /** @return the label, unit and accepted range */
    public FieldSpec spec() {
        return spec;
    }

    /** @return why the typed text is not accepted, or null */
    public String refusal() {
        return refusal;
    }

    /** @return the validator's problems shown at this field */
    public List<Problem> problems() {
        return problems;
    }

    /** @return the decoration at the field */
    public ControlDecoration decoration() {
        return decoration;
    }

    /** @return the text the field shows (a choice's label, "true"/"false" for a switch) */
    public String text() {
        if (control instanceof Text t) {
            return t.getText();
        }
        if (control instanceof Combo c) {
            return c.getText();
        }
        return Boolean.toString(((Button) control).getSelection());
    }

    /**
     * Enters text as the author would, then presses Enter: the value is applied when it is accepted.
     *
     * @return whether a change was made to the battery
     */
    public boolean enter(String text) {
        if (!(control instanceof Text t)) {
            throw new IllegalStateException(spec.label() + " is not a text field");
        }
        t.setText(text); // fires Verify and Modify like typing
        return commit();
    }

    /**
     * Chooses an entry of a choice field (by its shown label) as the author would.
     *
     * @return whether a change was made
     */
    public boolean choose(String label) {
        Combo combo = (Combo) control;
        int index = combo.indexOf(label);
        if (index < 0) {
            throw new IllegalArgumentException(label + " is not a choice of " + spec.label() + ": "
                    + List.of(combo.getItems()));
        }
        combo.select(index);
        return commit();
    }

    private void checkInput() {
        refusal = null;
        if (control instanceof Text t && spec.domain() != null) {
            String s = t.getText();
            if (kind == Kind.NUMBER_LIST) {
                for (String part : parts(s)) {
                    refusal = refusal == null ? spec.domain().refusal(part) : refusal;
                }
                if (parts(s).isEmpty()) {
                    refusal = "at least one value is required";
                }
            } else if (!(s.isBlank() && feature.isUnsettable())) {
                refusal = spec.domain().refusal(s);
            }
        }
        showDecoration();
    }

    private static List<String> parts(String s) {
        List<String> out = new ArrayList<>();
        for (String p : s.split("[,\\s]+")) {
            if (!p.isEmpty()) {
                out.add(p);
            }
        }
        return out;
    }

    /**
     * Applies the field's value to the model when it is accepted and differs from the model's.
     *
     * @return whether a change was made
     */
    public boolean commit() {
        if (control.isDisposed() || updating) {
            return false;
        }
        control.getDisplay().timerExec(-1, idleCommit);
        checkInput();
        if (refusal != null) {
            status.accept(spec.label() + ": " + refusal);
            return false;
        }
        Object value = value();
        boolean unset = value == SetCommand.UNSET_VALUE;
        if (unset ? !owner.eIsSet(feature) : Objects.equals(value, owner.eGet(feature))
                && (!feature.isUnsettable() || owner.eIsSet(feature))) {
            return false;
        }
        String what = spec.label() + (unset ? " cleared" : " = " + text()
                + (spec.unit().isEmpty() ? "" : " " + spec.unit()));
        boolean done = document.execute(new CommandWrapper(what, what,
                SetCommand.create(document.domain(), owner, feature, value)));
        if (done) {
            status.accept(what);
        }
        return done;
    }

    private Object value() {
        switch (kind) {
            case SWITCH:
                return ((Button) control).getSelection();
            case CHOICE: {
                int i = ((Combo) control).getSelectionIndex();
                EEnum type = (EEnum) ((EAttribute) feature).getEAttributeType();
                return i < 0 ? owner.eGet(feature) : type.getELiterals().get(i).getInstance();
            }
            case REFERENCE: {
                int i = ((Combo) control).getSelectionIndex();
                return i < 0 ? owner.eGet(feature) : referenceChoices.get(i);
            }
            case NUMBER_LIST: {
                List<Double> values = new ArrayList<>();
                for (String p : parts(((Text) control).getText())) {
                    values.add(Double.parseDouble(p));
                }
                return values;
            }
            case NUMBER: {
                String s = ((Text) control).getText().trim();
                if (s.isEmpty() && feature.isUnsettable()) {
                    return SetCommand.UNSET_VALUE;
                }
                Class<?> type = ((EAttribute) feature).getEAttributeType().getInstanceClass();
                if (type == int.class || type == Integer.class) {
                    return (int) Long.parseLong(s);
                }
                if (type == long.class || type == Long.class) {
                    return Long.parseLong(s);
                }
                return Double.parseDouble(s);
            }
            default:
                return ((Text) control).getText();
        }
    }

    /** Shows the model's current value (after an undo, a redo or another field's change) and the unit. */
    public void refresh() {
        if (control.isDisposed()) {
            return;
        }
        spec = FieldSpec.of(owner, feature);
        unitLabel.setText(spec.unit());
        updating = true;
        try {
            switch (kind) {
                case SWITCH -> ((Button) control).setSelection(Boolean.TRUE.equals(owner.eGet(feature)));
                case CHOICE -> refreshChoice();
                case REFERENCE -> refreshReference();
                default -> refreshText();
            }
        } finally {
            updating = false;
        }
    }

    private void refreshChoice() {
        Combo combo = (Combo) control;
        EEnum type = (EEnum) ((EAttribute) feature).getEAttributeType();
        if (combo.getItemCount() == 0) {
            for (EEnumLiteral l : type.getELiterals()) {
                combo.add(ElementLabels.words(l.getName().replace('_', ' ').toLowerCase(java.util.Locale.ROOT)));
            }
        }
        Object v = owner.eGet(feature);
        int index = v instanceof Enumerator e ? type.getELiterals().indexOf(type.getEEnumLiteral(e.getValue())) : -1;
        if (combo.getSelectionIndex() != index) {
            combo.select(index);
        }
    }

    private void refreshReference() {
        Combo combo = (Combo) control;
        Battery battery = document.battery();
        referenceChoices = new ArrayList<>(battery.getSteps());
        combo.setItems(referenceChoices.stream().map(Step::getId).toArray(String[]::new));
        Object v = owner.eGet(feature);
        combo.select(referenceChoices.indexOf(v));
    }

    private void refreshText() {
        Text t = (Text) control;
        String shown = modelText();
        if (t.getText().equals(shown)) {
            return;
        }
        if (t.isFocusControl() && refusal == null && kind == Kind.NUMBER && sameNumber(t.getText(), shown)) {
            return; // the author's "1.50" is the model's 1.5: leave the text and its caret alone
        }
        t.setText(shown);
        refusal = null;
        showDecoration();
    }

    private static boolean sameNumber(String a, String b) {
        try {
            return Double.parseDouble(a.trim()) == Double.parseDouble(b.trim());
        } catch (NumberFormatException e) {
            return false;
        }
    }

    private String modelText() {
        if (feature.isUnsettable() && !owner.eIsSet(feature)) {
            return "";
        }
        Object v = owner.eGet(feature);
        if (v == null) {
            return "";
        }
        if (v instanceof List<?> list) {
            return list.stream().map(x -> x instanceof Double d ? Units.format(d) : String.valueOf(x))
                    .collect(Collectors.joining(", "));
        }
        if (v instanceof Double d) {
            return Units.format(d);
        }
        return String.valueOf(v);
    }

    /** Shows the validator's problems about this setting at the field. */
    void showProblems(List<Problem> mine) {
        problems = List.copyOf(mine);
        showDecoration();
    }

    private void showDecoration() {
        if (decoration == null || control.isDisposed()) {
            return;
        }
        FieldDecorationRegistry registry = FieldDecorationRegistry.getDefault();
        if (refusal != null) {
            decoration.setImage(registry.getFieldDecoration(FieldDecorationRegistry.DEC_ERROR).getImage());
            decoration.setDescriptionText("Not applied: " + refusal + (spec.domain() == null ? ""
                    : " (accepted: " + spec.domain().describe() + ")"));
            decoration.show();
            return;
        }
        if (problems.isEmpty()) {
            decoration.hide();
            return;
        }
        boolean error = problems.stream().anyMatch(p -> p.severity() == Severity.ERROR);
        decoration.setImage(registry.getFieldDecoration(error ? FieldDecorationRegistry.DEC_ERROR
                : FieldDecorationRegistry.DEC_WARNING).getImage());
        decoration.setDescriptionText(problems.stream().map(p -> p.code().code() + ": " + p.message())
                .collect(Collectors.joining("\n")));
        decoration.show();
    }

    /** @return whether the decoration is showing */
    public boolean decorated() {
        return decoration.isVisible();
    }

    /** Puts the caret into the field. */
    public void focus() {
        control.setFocus();
        if (control instanceof Text t) {
            t.selectAll();
        }
    }
}
