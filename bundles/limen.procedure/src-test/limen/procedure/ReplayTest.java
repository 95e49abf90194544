package limen.procedure;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.junit.jupiter.api.Test;

import limen.psychometric.PsychometricFunction;
import limen.psychometric.Sigmoids;

/** Rebuilding every method by replaying its recorded responses gives the same state (for resume after a crash). */
class ReplayTest {

    private static final PsychometricFunction LISTENER = new PsychometricFunction(Sigmoids.LOGISTIC, 0.3, 0.6, 0.5, 0.02);

    static List<ProcedureFactory> factories() {
        return List.of(
                UpDownSettings.builder().rule(3, 1).start(2).additive(0.5).shrink(0.5, 2).minimumStep(0.1).limits(-5, 5)
                        .stop(StopRule.afterTrials(200)).build(),
                UpDownSettings.builder().weighted(0.75).start(4).multiplicative(1.5).stop(StopRule.afterTrials(200)).build(),
                PestSettings.builder().start(2).additive(1).stop(StopRule.afterTrials(200)).build(),
                QuestSettings.builder().grid(-3, 3, 61).prior(0, 1).stop(StopRule.afterTrials(200)).build(),
                QuestSettings.builder().grid(-3, 3, 61).placement(Placement.MEAN).estimator(Placement.MEAN)
                        .stop(StopRule.afterTrials(200)).build(),
                PsiSettings.builder().thresholds(-2, -1, 0, 1, 2).spreads(0.3, 0.6, 1.2).lapses(0, 0.03)
                        .candidates(-2, -1.5, -1, -0.5, 0, 0.5, 1, 1.5, 2).stop(StopRule.afterTrials(200)).build(),
                ConstantStimuliSettings.builder().values(-1, -0.5, 0, 0.5, 1, 1.5).blocks(2, 20).build());
    }

    @ParameterizedTest
    @MethodSource("factories")
    void replayGivesTheSameState(ProcedureFactory f) {
        AdaptiveProcedure p = f.create(new SplittableRandom(42));
        SplittableRandom listener = new SplittableRandom(7);
        for (int t = 0; t < 57; t++) {
            double x = p.nextValue();
            p.record(x, listener.nextDouble() < LISTENER.psi(x));
        }
        AdaptiveProcedure q = f.replay(new SplittableRandom(42), p.responses());
        assertEquals(p.responses(), q.responses());
        assertEquals(p.reversals(), q.reversals());
        assertEquals(p.estimate(), q.estimate());
        assertEquals(p.trials(), q.trials());
        assertEquals(p.nextValue(), q.nextValue());
        // and both continue identically
        for (int t = 0; t < 20; t++) {
            double x = p.nextValue();
            boolean c = listener.nextDouble() < LISTENER.psi(x);
            p.record(x, c);
            q.record(q.nextValue(), c);
        }
        assertEquals(p.responses(), q.responses());
        assertEquals(p.estimate(), q.estimate());
    }

    @Test
    void interleavedTracksReplayFromTheirAnswers() {
        ProcedureFactory a = factories().get(0);
        ProcedureFactory b = factories().get(2);
        Task yn = new Task.YesNo(0.2);
        Task fc = new Task.ForcedChoice(3);
        ModelListener.Run ly = new ModelListener(LISTENER.withGuess(0.1), 0.02).start(new SplittableRandom(3));
        ModelListener.Run lf = new ModelListener(LISTENER.withGuess(1.0 / 3), 0).start(new SplittableRandom(4));
        Interleaver il = new Interleaver(List.of(new AdaptiveTrack("yn", a.create(new SplittableRandom(1)), yn, new SplittableRandom(2)),
                new AdaptiveTrack("fc", b.create(new SplittableRandom(5)), fc, new SplittableRandom(6))), new SplittableRandom(9));
        List<Answer> answers = new ArrayList<>();
        for (int t = 0; t < 90; t++) {
            int i = il.nextTrack();
            Answer ans = (i == 0 ? ly : lf).answer(il.nextTrial());
            answers.add(ans);
            il.answer(ans);
        }
        Interleaver again = new Interleaver(List.of(new AdaptiveTrack("yn", a.create(new SplittableRandom(1)), yn, new SplittableRandom(2)),
                new AdaptiveTrack("fc", b.create(new SplittableRandom(5)), fc, new SplittableRandom(6))), new SplittableRandom(9));
        for (Answer ans : answers) {
            again.nextTrial();
            again.answer(ans);
        }
        for (int i = 0; i < 2; i++) {
            assertEquals(il.tracks().get(i).history(), again.tracks().get(i).history());
            assertEquals(il.tracks().get(i).procedure().estimate(), again.tracks().get(i).procedure().estimate());
        }
        assertEquals(il.nextTrack(), again.nextTrack());
        assertEquals(il.nextTrial(), again.nextTrial());
        AdaptiveTrack single = AdaptiveTrack.replay("yn", a, new SplittableRandom(1), yn, new SplittableRandom(2),
                il.tracks().get(0).history().stream().map(TrialOutcome::answer).toList());
        assertEquals(il.tracks().get(0).history(), single.history());
        assertEquals(il.tracks().get(0).falseAlarms(), single.falseAlarms());
    }
}
