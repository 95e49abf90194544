package limen.procedure.internal;

/**
 * The convergence point of an n-down/m-up staircase with down step S_down and up step S_up: the
 * proportion correct p at which the expected displacement per trial is zero,
 * r_down(p)·S_down = r_up(p)·S_up, where r_down and r_up are the long-run rates of down and up moves
 * of the run-counter Markov chain at a fixed level.
 * <p>
 * For m = 1 and equal steps this is p^n = 1/2 (Levitt 1971, JASA 49, 467-477); for n = m = 1 it is
 * p·S_down = (1 − p)·S_up (Kaernbach 1991, Perception &amp; Psychophysics 49, 227-229). It is the
 * small-step limit: with fixed large steps the actual convergence point moves (García-Pérez 1998).
 */
public final class TransformedTarget {

    private TransformedTarget() {
    }

    /**
     * @return p in (0, 1) solving r_down(p)·downStep = r_up(p)·upStep (bisection to 1e-13)
     */
    public static double solve(int nDown, int mUp, double downStep, double upStep) {
        double lo = 1e-12;
        double hi = 1 - 1e-12;
        for (int i = 0; i < 200 && hi - lo > 1e-14; i++) {
            double mid = 0.5 * (lo + hi);
            double[] r = rates(nDown, mUp, mid);
            if (r[0] * downStep - r[1] * upStep > 0) {
                hi = mid;
            } else {
                lo = mid;
            }
        }
        return 0.5 * (lo + hi);
    }

    /**
     * Long-run rates of down and up moves per trial at a fixed proportion correct p.
     * States: C_c (c = 0..n−1 correct in a row, C_0 the fresh state) and W_w (w = 1..m−1 wrong in a
     * row); a move resets to C_0. Stationary probabilities by power iteration of the (aperiodic,
     * since C_0 can return to itself after any move) chain.
     *
     * @return {r_down, r_up}
     */
    public static double[] rates(int nDown, int mUp, double p) {
        int states = nDown + mUp - 1; // indices 0..n-1 = C_c, n..n+m-2 = W_1..W_{m-1}
        double[] pi = new double[states];
        pi[0] = 1;
        double down = 0;
        double up = 0;
        for (int iter = 0; iter < 100000; iter++) {
            double[] next = new double[states];
            down = 0;
            up = 0;
            for (int s = 0; s < states; s++) {
                double w = pi[s];
                if (w == 0) {
                    continue;
                }
                int correctRun = s < nDown ? s : 0;
                int wrongRun = s < nDown ? 0 : s - nDown + 1;
                // correct answer
                if (correctRun + 1 == nDown) {
                    down += w * p;
                    next[0] += w * p;
                } else {
                    next[correctRun + 1] += w * p;
                }
                // wrong answer
                if (wrongRun + 1 == mUp) {
                    up += w * (1 - p);
                    next[0] += w * (1 - p);
                } else {
                    next[nDown + wrongRun] += w * (1 - p);
                }
            }
            double diff = 0;
            for (int s = 0; s < states; s++) {
                diff = Math.max(diff, Math.abs(next[s] - pi[s]));
            }
            pi = next;
            if (diff < 1e-15) {
                break;
            }
        }
        return new double[] {down, up};
    }
}
