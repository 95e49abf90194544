package limen.ui.handlers;

import org.eclipse.jface.preference.DirectoryFieldEditor;
import org.eclipse.jface.preference.FieldEditorPreferencePage;
import org.eclipse.jface.preference.RadioGroupFieldEditor;

import limen.ui.LimenPreferences;

/** Preferences: where the lab's files live, and the sample rate used for previews. */
public final class FoldersPreferencePage extends FieldEditorPreferencePage {

    public FoldersPreferencePage() {
        super("Folders and preview", GRID);
        setDescription("Where Limen finds batteries and calibrations, and where sessions are stored.");
    }

    @Override
    protected void createFieldEditors() {
        addField(new DirectoryFieldEditor(LimenPreferences.WORKSPACE_FOLDER, "&Workspace folder:",
                getFieldEditorParent()));
        addField(new DirectoryFieldEditor(LimenPreferences.ARCHIVE_FOLDER, "Session &archive:",
                getFieldEditorParent()));
        addField(new RadioGroupFieldEditor(LimenPreferences.SAMPLE_RATE_HZ, "Preview sample rate", 3,
                new String[][] {{"44.1 kHz", "44100"}, {"48 kHz", "48000"}, {"96 kHz", "96000"}},
                getFieldEditorParent(), true));
    }
}
