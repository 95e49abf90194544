package limen.procedure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;

import limen.psychometric.Sigmoids;

/** Tasks, trial plans and the model listener's answers, checked against their defining probabilities. */
class TaskAndListenerTest {

    @Test
    void forcedChoiceDrawsTheTargetIntervalUniformlyAndWrongAnswersAmongTheOthers() {
        Task.ForcedChoice fc = new Task.ForcedChoice(4);
        ModelListener m = ModelListener.forTask("logistic:mid=0,scale=1", fc, 0);
        assertEquals(0.25, m.function().guess());
        ModelListener.Run run = m.start(new SplittableRandom(11));
        SplittableRandom rng = new SplittableRandom(12);
        int n = 200_000;
        int[] targets = new int[4];
        int correct = 0;
        int[][] wrongOffsets = new int[4][4];
        for (int i = 0; i < n; i++) {
            TrialPlan p = fc.plan(0.0, rng);
            targets[p.targetInterval()]++;
            Answer a = run.answer(p);
            if (fc.isCorrect(p, a)) {
                correct++;
            } else {
                wrongOffsets[p.targetInterval()][a.code()]++;
            }
        }
        // psi(mid) = 0.25 + 0.75 * 0.5 = 0.625; binomial SD sqrt(p(1-p)/n) = 0.0011
        assertEquals(0.625, (double) correct / n, 0.005);
        for (int t = 0; t < 4; t++) {
            assertEquals(0.25, (double) targets[t] / n, 0.005);
            assertEquals(0, wrongOffsets[t][t]);
            for (int w = 0; w < 4; w++) {
                if (w != t) {
                    assertEquals(1.0 / 3, (double) wrongOffsets[t][w] / (targets[t] * 0.375), 0.03);
                }
            }
        }
    }

    @Test
    void yesNoCatchTrialsRecordFalseAlarmsAndDoNotReachTheProcedure() {
        Task.YesNo yn = new Task.YesNo(0.25);
        ModelListener m = ModelListener.forTask("normal:mid=10,sd=2,lapse=0.05", yn, 0.1);
        assertEquals(0.1, m.function().guess());
        AdaptiveTrack t = new AdaptiveTrack("yn", ConstantStimuliSettings.builder().values(8, 10, 12).blocks(100, 20)
                .fit(Sigmoids.NORMAL, 0.1, 0.05).build().create(new SplittableRandom(1)), yn, new SplittableRandom(2));
        ModelListener.Run run = m.start(new SplittableRandom(3));
        int presented = 0;
        while (!t.finished()) {
            t.answer(run.answer(t.nextTrial()));
            presented++;
        }
        assertEquals(6000, t.procedure().trials());
        assertEquals(presented - 6000, t.catchTrials());
        assertEquals(0.25, t.catchTrials() / (double) presented, 0.01);
        assertEquals(0.1, t.falseAlarmRate(), 0.015);
        // yes rate at the midpoint: 0.1 + 0.85 * 0.5
        ConstantStimuli cs = (ConstantStimuli) t.procedure();
        assertEquals(0.525, cs.correctCounts()[1] / (double) cs.presentedCounts()[1], 0.03);
    }

    @Test
    void catchTrialScoring() {
        Task.YesNo yn = new Task.YesNo(0.5);
        TrialPlan c = new TrialPlan(3, 1, -1, true);
        assertTrue(yn.isCorrect(c, Answer.yesNo(false)));
        assertFalse(yn.isCorrect(c, Answer.yesNo(true)));
        assertTrue(new TrialOutcome(c, Answer.yesNo(true), false).falseAlarm());
        assertThrows(IllegalArgumentException.class, () -> new TrialPlan(3, 2, 2, false));
        assertThrows(IllegalArgumentException.class, () -> new Task.ForcedChoice(1));
    }

    @Test
    void driftMovesTheLocationAsARandomWalk() {
        ModelListener m = ModelListener.forTask("logistic:mid=0,scale=1", new Task.ForcedChoice(2), 0).withDrift(0.1);
        int runs = 2000;
        double ss = 0;
        for (int r = 0; r < runs; r++) {
            ModelListener.Run run = m.start(new SplittableRandom(r));
            for (int i = 0; i < 100; i++) {
                run.answer(new TrialPlan(0, 2, 0, false));
            }
            ss += run.current().location() * run.current().location();
        }
        // after 100 steps of SD 0.1 the location's SD is 0.1 * sqrt(100) = 1
        assertEquals(1.0, Math.sqrt(ss / runs), 0.05);
        assertEquals(0.0, m.trueValue(Target.psi(0.75)), 1e-12);
    }
}
