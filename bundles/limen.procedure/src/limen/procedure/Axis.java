package limen.procedure;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.random.RandomGenerator;

/**
 * The axis on which a model-based procedure works: the value itself, or its level in decibels
 * u = 20 log10 x (values must be positive), so that Bayesian grids, slopes and standard deviations
 * of quantities such as frequency differences keep the meaning they have for quantities in dB.
 * {@link #wrap} turns a procedure working on the axis into one that presents and records values of x.
 */
public enum Axis {
    /** u = x */
    LINEAR,
    /** u = 20 log10 x, x &gt; 0 */
    DECIBEL;

    /** @return u for x */
    public double toAxis(double x) {
        if (this == LINEAR) {
            return x;
        }
        if (!(x > 0)) {
            throw new IllegalArgumentException("a value on a decibel axis must be > 0, was " + x);
        }
        return 20 * Math.log10(x);
    }

    /** @return x for u */
    public double fromAxis(double u) {
        return this == LINEAR ? u : Math.pow(10, u / 20);
    }

    /**
     * @param onAxis a factory of procedures that work in axis units
     * @return a factory of procedures that present and record x; estimates are converted to x, their
     *         uncertainty stays in axis units (dB for {@link #DECIBEL}), as do the inner stop rules
     */
    public ProcedureFactory wrap(ProcedureFactory onAxis) {
        if (this == LINEAR) {
            return onAxis;
        }
        return new ProcedureFactory() {
            @Override
            public AdaptiveProcedure create(RandomGenerator rng) {
                return new OnAxis(Axis.this, onAxis.create(rng));
            }

            @Override
            public String toString() {
                return "decibel axis: " + onAxis;
            }
        };
    }

    /** A procedure working in axis units seen from the value side. */
    private static final class OnAxis implements AdaptiveProcedure {
        private final Axis axis;
        private final AdaptiveProcedure inner;
        private final List<Response> responses = new ArrayList<>();

        OnAxis(Axis axis, AdaptiveProcedure inner) {
            this.axis = axis;
            this.inner = inner;
        }

        @Override
        public double nextValue() {
            return axis.fromAxis(inner.nextValue());
        }

        @Override
        public void record(double value, boolean correct) {
            double u = axis.toAxis(value);
            inner.record(u, correct);
            responses.add(new Response(value, correct));
        }

        @Override
        public boolean finished() {
            return inner.finished();
        }

        @Override
        public Estimate estimate() {
            Estimate e = inner.estimate();
            return e.available() ? new Estimate(axis.fromAxis(e.value()), e.uncertainty(), e.kind(), e.basis()) : e;
        }

        @Override
        public Target target() {
            return inner.target(); // a proportion: unchanged by a monotone change of axis
        }

        @Override
        public int trials() {
            return inner.trials();
        }

        @Override
        public List<Reversal> reversals() {
            List<Reversal> out = new ArrayList<>();
            for (Reversal r : inner.reversals()) {
                out.add(new Reversal(r.trial(), axis.fromAxis(r.value()), r.direction()));
            }
            return Collections.unmodifiableList(out);
        }

        @Override
        public List<Response> responses() {
            return Collections.unmodifiableList(responses);
        }
    }
}
