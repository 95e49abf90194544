package limen.session;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;

import limen.model.Battery;
import limen.model.OrderingPolicy;
import limen.model.Step;

/**
 * The order in which one participant meets a battery's steps. Steps marked fixed keep their place; the
 * others are permuted among the remaining places:
 * <ul>
 * <li>FIXED: as written;</li>
 * <li>SHUFFLED: a Fisher-Yates shuffle seeded by the battery's shuffle seed if it sets one, else by the
 * session seed (recorded in the session header either way);</li>
 * <li>LATIN_SQUARE: row {@code r} of a Williams design (Williams 1949, Aust. J. Sci. Res. A2, 149-168): for
 * n movable steps, row 0 is 0, 1, n-1, 2, n-2, ...; row r adds r (mod n); for odd n the mirrored rows follow,
 * giving 2n rows, so every step precedes every other equally often. Row r is chosen by the caller, usually
 * from how many participants of this battery the archive already holds.</li>
 * </ul>
 */
public final class StepOrder {

    private StepOrder() {
    }

    /** The order for one session. */
    public static List<Step> order(Battery battery, long sessionSeed, int latinSquareRow) {
        List<Step> steps = battery.getSteps();
        List<Integer> movable = new ArrayList<>();
        for (int i = 0; i < steps.size(); i++) {
            if (!steps.get(i).isFixedPosition()) {
                movable.add(i);
            }
        }
        int[] perm = permutation(battery.getOrdering(), movable.size(),
                battery.isSetShuffleSeed() ? battery.getShuffleSeed() : sessionSeed, latinSquareRow);
        List<Step> out = new ArrayList<>(steps);
        for (int k = 0; k < movable.size(); k++) {
            out.set(movable.get(k), steps.get(movable.get(perm[k])));
        }
        return out;
    }

    /** Number of distinct rows the Latin-square ordering cycles through for n movable steps. */
    public static int latinSquareRows(int n) {
        return n <= 1 ? 1 : (n % 2 == 0 ? n : 2 * n);
    }

    static int[] permutation(OrderingPolicy policy, int n, long seed, int row) {
        int[] p = new int[n];
        for (int i = 0; i < n; i++) {
            p[i] = i;
        }
        if (n <= 1 || policy == null || policy == OrderingPolicy.FIXED) {
            return p;
        }
        if (policy == OrderingPolicy.SHUFFLED) {
            SplittableRandom rng = new SplittableRandom(seed);
            for (int i = n - 1; i > 0; i--) {
                int j = rng.nextInt(i + 1);
                int t = p[i];
                p[i] = p[j];
                p[j] = t;
            }
            return p;
        }
        return williamsRow(n, Math.floorMod(row, latinSquareRows(n)));
    }

    /** Row r (0-based, r < latinSquareRows(n)) of the Williams design for n treatments. */
    static int[] williamsRow(int n, int r) {
        int[] first = new int[n];
        int lo = 1;
        int hi = n - 1;
        first[0] = 0;
        for (int k = 1; k < n; k++) {
            first[k] = (k % 2 == 1) ? lo++ : hi--;
        }
        int[] row = new int[n];
        int shift = r % n;
        for (int k = 0; k < n; k++) {
            row[k] = (first[k] + shift) % n;
        }
        if (r >= n) { // odd n: the mirrored half
            for (int k = 0; k < n / 2; k++) {
                int t = row[k];
                row[k] = row[n - 1 - k];
                row[n - 1 - k] = t;
            }
        }
        return row;
    }
}
