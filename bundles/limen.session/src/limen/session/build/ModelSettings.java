package limen.session.build;

import java.util.List;

import org.eclipse.emf.common.util.Enumerator;
import org.eclipse.emf.ecore.EAttribute;
import org.eclipse.emf.ecore.EObject;

import limen.core.extension.Settings;
import limen.model.AbsoluteLevel;
import limen.model.ConstantStimuliProcedure;
import limen.model.ContributedProcedure;
import limen.model.MaskerNoise;
import limen.model.PestProcedure;
import limen.model.Procedure;
import limen.model.PsiProcedure;
import limen.model.QuestProcedure;
import limen.model.Setting;
import limen.model.SettingsGroup;
import limen.model.Step;
import limen.model.Stimulus;
import limen.model.TransformedUpDownProcedure;
import limen.model.WeightedUpDownProcedure;

/**
 * How a battery names an extension and what settings it hands it; the one translation from the model to
 * {@link Settings}, the same for Limen's own procedures and stimulus kinds and for a lab's.
 * <ul>
 * <li>A built-in procedure element is named by its class ({@code TransformedUpDownProcedure} is
 * {@code limen.transformed-up-down}, and so on) and hands over every attribute under its model name: reals,
 * integers, booleans, enumerations as their literal names (e.g. {@code stepMode = MULTIPLICATIVE}), lists of
 * reals; an unsettable attribute only when it is set.</li>
 * <li>A {@code ContributedProcedure} is named by its settings group's contributor id and hands over the group's
 * entries, each parsed as its declared type.</li>
 * <li>A stimulus is named by its first contributed settings group when it has one, else by its kind
 * ({@code FREQUENCY_DISCRIMINATION} is {@code limen.frequency-discrimination}, ...). It hands over
 * {@code standardFrequencyHz}, {@code rampDurationSeconds}, {@code unit} (the varied quantity's unit), the
 * masker's {@code maskerSpectrum}, {@code maskerLowCutoffHz}, {@code maskerHighCutoffHz} and, for a fixed masker
 * level, {@code maskerLevelDbSpl}; then the contributed group's entries (a name given twice is refused).</li>
 * </ul>
 */
public final class ModelSettings {

    private ModelSettings() {
    }

    /** @return the procedure kind's identifier a track's procedure names */
    public static String procedureId(Procedure p) {
        if (p instanceof ContributedProcedure c) {
            if (c.getSettings() == null || c.getSettings().getContributorId() == null) {
                throw new IllegalArgumentException("the contributed procedure names no contributor");
            }
            return c.getSettings().getContributorId();
        }
        if (p instanceof TransformedUpDownProcedure) {
            return "limen.transformed-up-down";
        }
        if (p instanceof WeightedUpDownProcedure) {
            return "limen.weighted-up-down";
        }
        if (p instanceof PestProcedure) {
            return "limen.pest";
        }
        if (p instanceof QuestProcedure) {
            return "limen.quest";
        }
        if (p instanceof PsiProcedure) {
            return "limen.psi";
        }
        if (p instanceof ConstantStimuliProcedure) {
            return "limen.constant-stimuli";
        }
        throw new IllegalArgumentException("procedure " + p.eClass().getName() + " names no procedure kind");
    }

    /** @return the settings a track's procedure hands its kind */
    public static Settings of(Procedure p) {
        if (p instanceof ContributedProcedure c) {
            return of(c.getSettings());
        }
        Settings.Builder b = Settings.builder();
        attributes(p, "", b);
        return b.build();
    }

    /**
     * @return the entries of a settings group, each parsed as its type (INTEGER as a long, REAL as a double,
     *         BOOLEAN as true/false, STRING as it is)
     * @throws IllegalArgumentException naming a value that does not parse
     */
    public static Settings of(SettingsGroup group) {
        Settings.Builder b = Settings.builder();
        if (group == null) {
            return b.build();
        }
        for (Setting s : group.getEntries()) {
            String v = s.getValue();
            try {
                switch (s.getType()) {
                    case INTEGER -> b.integer(s.getName(), Long.parseLong(v.strip()));
                    case REAL -> b.real(s.getName(), Double.parseDouble(v.strip()));
                    case BOOLEAN -> {
                        if (!"true".equals(v) && !"false".equals(v)) {
                            throw new IllegalArgumentException("setting '" + s.getName() + "' = " + v + " is not true or false");
                        }
                        b.bool(s.getName(), Boolean.parseBoolean(v));
                    }
                    default -> b.text(s.getName(), v == null ? "" : v);
                }
            } catch (NumberFormatException | NullPointerException e) {
                throw new IllegalArgumentException("setting '" + s.getName() + "' = " + v + " is not of type " + s.getType(), e);
            }
        }
        return b.build();
    }

    /** @return the stimulus design's identifier a step names */
    public static String stimulusId(Step step) {
        Stimulus st = step.getStimulus();
        if (st == null) {
            throw new IllegalArgumentException("step " + step.getId() + " has no stimulus");
        }
        if (!st.getContributions().isEmpty()) {
            String id = st.getContributions().get(0).getContributorId();
            if (id == null) {
                throw new IllegalArgumentException("step " + step.getId() + ": the stimulus contribution names no contributor");
            }
            return id;
        }
        return switch (st.getKind()) {
            case FREQUENCY_DISCRIMINATION -> "limen.frequency-discrimination";
            case INTENSITY_DISCRIMINATION -> "limen.intensity-discrimination";
            case DETECTION_QUIET -> "limen.detection-quiet";
            case DETECTION_NOISE -> "limen.detection-noise";
        };
    }

    /** @return the settings a step's stimulus hands its design */
    public static Settings stimulusSettings(Step step) {
        Stimulus st = step.getStimulus();
        Settings.Builder b = Settings.builder().real("standardFrequencyHz", st.getStandardFrequencyHz())
                .real("rampDurationSeconds", st.getRampDurationSeconds());
        if (step.getVariedQuantity() != null) {
            b.text("unit", step.getVariedQuantity().getUnit().getName());
        }
        MaskerNoise m = st.getMasker();
        if (m != null) {
            b.text("maskerSpectrum", m.getSpectrum().getName()).real("maskerLowCutoffHz", m.getLowCutoffHz())
                    .real("maskerHighCutoffHz", m.getHighCutoffHz());
            if (m.getLevel() instanceof AbsoluteLevel a) {
                b.real("maskerLevelDbSpl", a.getLevelDbSpl());
            }
        }
        Settings common = b.build();
        return st.getContributions().isEmpty() ? common : common.plus(of(st.getContributions().get(0)));
    }

    private static void attributes(EObject o, String prefix, Settings.Builder b) {
        for (EAttribute a : o.eClass().getEAllAttributes()) {
            if (a.isDerived() || a.isTransient() || a.isUnsettable() && !o.eIsSet(a)) {
                continue;
            }
            String name = prefix + a.getName();
            Object v = o.eGet(a);
            if (a.isMany()) {
                List<?> list = (List<?>) v;
                double[] reals = new double[list.size()];
                for (int i = 0; i < reals.length; i++) {
                    reals[i] = ((Number) list.get(i)).doubleValue();
                }
                b.reals(name, reals);
            } else if (v instanceof Double d) {
                b.real(name, d);
            } else if (v instanceof Integer || v instanceof Long) {
                b.integer(name, ((Number) v).longValue());
            } else if (v instanceof Boolean z) {
                b.bool(name, z);
            } else if (v instanceof Enumerator e) {
                b.text(name, e.getName());
            } else if (v instanceof String s) {
                b.text(name, s);
            }
        }
    }
}
