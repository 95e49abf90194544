package limen.model.validation;

import limen.model.SettingsGroup;

/**
 * Answers, for the validator, whether the procedure or stimulus design that a {@link SettingsGroup} names is
 * installed and accepts its settings. The model cannot know the installed extensions itself (they live in
 * bundles above it), so it asks whoever is installed under this interface through the same registry as every
 * extension ({@link limen.core.extension.Extensions}); {@code limen.session} provides the implementation.
 * When no check is installed (the model on its own) contributed groups are checked for syntax only.
 */
public interface ContributionCheck {

    /**
     * @param group a settings group inside a battery (of a {@code ContributedProcedure} or a {@code Stimulus})
     * @return null when the group is none of this check's business or its contributor is installed and accepts
     *         the settings; otherwise what is wrong
     */
    Finding check(SettingsGroup group);

    /**
     * What is wrong with a contributed group.
     *
     * @param installed false when no installed extension has the group's contributor id (LM0805), true when it
     *        refuses the settings (LM0806)
     * @param message the reason, naming the contributor id (and, when not installed, what is installed)
     */
    record Finding(boolean installed, String message) {
        /** Validates the message. */
        public Finding {
            if (message == null || message.isBlank()) {
                throw new IllegalArgumentException("a finding needs a message");
            }
        }
    }
}
