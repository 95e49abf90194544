package limen.procedure;

import java.util.List;
import java.util.random.RandomGenerator;

/**
 * Creates fresh procedures of one configuration. Settings classes implement it.
 */
@FunctionalInterface
public interface ProcedureFactory {

    /**
     * @param rng the generator for any randomness the procedure needs (it keeps and uses it); never null
     * @return a new procedure with no trials recorded
     */
    AdaptiveProcedure create(RandomGenerator rng);

    /**
     * Rebuilds a procedure from its recorded responses: creates it and records each response in
     * order. Given a generator in the same state as the original's at creation, the result is in the
     * same state as the original after those responses.
     *
     * @param rng       a generator in the original's initial state
     * @param responses the recorded trials, oldest first
     * @return the rebuilt procedure
     */
    default AdaptiveProcedure replay(RandomGenerator rng, List<Response> responses) {
        AdaptiveProcedure p = create(rng);
        for (Response r : responses) {
            p.record(r.value(), r.correct());
        }
        return p;
    }
}
