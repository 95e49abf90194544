package limen.session.build;

import limen.core.extension.Settings;
import limen.model.ContributedProcedure;
import limen.model.SettingsGroup;
import limen.model.Step;
import limen.model.Stimulus;
import limen.model.Track;
import limen.model.validation.ContributionCheck;
import limen.procedure.ProcedureKind;
import limen.procedure.StopRule;
import limen.session.BatteryTrialRenderer;
import limen.signal.StimulusDesign;

/**
 * The validator's view of the installed extensions ({@link ContributionCheck}, contributed through the same
 * registry as everything else): a contributed procedure's kind must be installed and must accept the track's
 * settings (its {@code create} runs with the real task, axis and guess rate); a stimulus's first contributed
 * design must be installed and accept the step's settings ({@link StimulusDesign#checkSettings}). Stopping
 * rules, tasks and the like are left to their own rules (LM01xx-LM04xx), so nothing is reported twice.
 */
public final class InstalledContributions implements ContributionCheck {

    @Override
    public Finding check(SettingsGroup group) {
        String id = group.getContributorId();
        if (group.eContainer() instanceof ContributedProcedure p && p.eContainer() instanceof Track track
                && track.eContainer() instanceof Step step) {
            ProcedureKind kind;
            try {
                kind = ProcedureBuilder.installedKind(id);
            } catch (IllegalArgumentException e) {
                return new Finding(false, e.getMessage());
            }
            Settings settings;
            StopRule stop;
            limen.procedure.ProcedureContext context;
            try {
                settings = ModelSettings.of(group);
                try {
                    stop = ProcedureBuilder.stopRule(track.getStoppingRule(), kind.endsByItself());
                } catch (IllegalArgumentException e) {
                    stop = StopRule.never(); // LM04xx reports the stopping rule
                }
                context = ProcedureBuilder.context(step, settings, stop);
            } catch (IllegalArgumentException e) {
                return null; // LM0802 or the task's and step's own rules report it
            }
            try {
                kind.create(settings, context);
                return null;
            } catch (IllegalArgumentException e) {
                return new Finding(true, "procedure '" + id + "' refuses its settings: " + e.getMessage());
            }
        }
        if (group.eContainer() instanceof Stimulus st && st.eContainer() instanceof Step step
                && st.getContributions().indexOf(group) == 0) {
            StimulusDesign design;
            try {
                design = BatteryTrialRenderer.installedDesign(id);
            } catch (IllegalArgumentException e) {
                return new Finding(false, e.getMessage());
            }
            Settings settings;
            try {
                settings = ModelSettings.stimulusSettings(step);
            } catch (IllegalArgumentException e) {
                return new Finding(true, "stimulus design '" + id + "' cannot take these settings: " + e.getMessage());
            }
            try {
                design.checkSettings(settings);
                return null;
            } catch (IllegalArgumentException e) {
                return new Finding(true, "stimulus design '" + id + "' refuses its settings: " + e.getMessage());
            }
        }
        return null;
    }
}
