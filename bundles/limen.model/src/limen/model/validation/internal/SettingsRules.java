package limen.model.validation.internal;

import static limen.model.validation.internal.Rules.report;

import java.util.HashMap;
import java.util.Map;

import org.eclipse.emf.common.util.DiagnosticChain;

import limen.core.extension.Extensions;
import limen.model.LimenPackage.Literals;
import limen.model.Setting;
import limen.model.SettingType;
import limen.model.SettingsGroup;
import limen.model.Stimulus;
import limen.model.validation.ContributionCheck;
import limen.model.validation.ProblemCode;

/** Invariants of {@link SettingsGroup}: names and typed values of contributed settings. */
public final class SettingsRules {

    private SettingsRules() {
    }

    /**
     * LM0803 blank contributor or name, LM0801 duplicate names, LM0802 values that do not parse; then, when the
     * syntax is sound and a {@link ContributionCheck} is installed, LM0805 (contributor not installed) and LM0806
     * (it refuses the settings); LM0807 for a second design on one stimulus.
     */
    public static boolean validSettings(SettingsGroup group, DiagnosticChain diagnostics,
            Map<Object, Object> context) {
        boolean ok = true;
        if (group.getContributorId() != null && group.getContributorId().isBlank()) {
            ok &= report(diagnostics, ProblemCode.SETTING_NAME_BLANK, group, Literals.SETTINGS_GROUP__CONTRIBUTOR_ID,
                    group.getContributorId(), Labels.of(group.eContainer()) + ": the contributor id is blank");
        }
        Map<String, Setting> names = new HashMap<>();
        for (Setting setting : group.getEntries()) {
            String name = setting.getName();
            if (name == null) {
                continue; // LM0001
            }
            if (name.isBlank()) {
                ok &= report(diagnostics, ProblemCode.SETTING_NAME_BLANK, setting, Literals.SETTING__NAME, name,
                        Labels.of(group) + ": a setting has a blank name");
            } else if (names.putIfAbsent(name, setting) != null) {
                ok &= report(diagnostics, ProblemCode.DUPLICATE_SETTING, setting, Literals.SETTING__NAME, name,
                        Labels.of(group) + ": setting '" + name + "' is given twice");
            }
            if (!parses(setting.getValue(), setting.getType())) {
                ok &= report(diagnostics, ProblemCode.SETTING_VALUE_TYPE, setting, Literals.SETTING__VALUE,
                        setting.getValue(), Labels.of(setting) + ": value '" + setting.getValue() + "' is not of type "
                                + setting.getType());
            }
        }
        if (group.eContainer() instanceof Stimulus stimulus && stimulus.getContributions().indexOf(group) > 0) {
            ok &= report(diagnostics, ProblemCode.STIMULUS_CONTRIBUTIONS_MANY, group,
                    Literals.SETTINGS_GROUP__CONTRIBUTOR_ID, group.getContributorId(), Labels.of(stimulus)
                            + ": only one contributed design can render a stimulus; '" + group.getContributorId()
                            + "' comes after '" + stimulus.getContributions().get(0).getContributorId() + "'");
        }
        if (ok && group.getContributorId() != null) {
            for (ContributionCheck check : Extensions.all(ContributionCheck.class)) {
                ContributionCheck.Finding finding = check.check(group);
                if (finding != null) {
                    ok &= report(diagnostics, finding.installed() ? ProblemCode.CONTRIBUTION_REFUSED
                            : ProblemCode.CONTRIBUTION_NOT_INSTALLED, group, Literals.SETTINGS_GROUP__CONTRIBUTOR_ID,
                            group.getContributorId(), Labels.of(group.eContainer()) + ": " + finding.message());
                }
            }
        }
        return ok;
    }

    /** @return whether the text is a valid value of the type (see the model's Setting.value documentation) */
    static boolean parses(String value, SettingType type) {
        if (type == SettingType.STRING) {
            return true;
        }
        if (value == null) {
            return false;
        }
        try {
            return switch (type) {
                case INTEGER -> {
                    Long.parseLong(value.strip());
                    yield true;
                }
                case REAL -> Double.isFinite(Double.parseDouble(value.strip()));
                case BOOLEAN -> value.equals("true") || value.equals("false");
                default -> true;
            };
        } catch (NumberFormatException e) {
            return false;
        }
    }
}
