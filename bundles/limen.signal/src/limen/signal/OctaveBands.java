package limen.signal;

/**
 * Fractional-octave bands per IEC 61260-1:2014 (base-ten system): octave ratio {@code G = 10^(3/10)},
 * exact mid-band frequencies {@code f_m = 1000·G^(x/b)} (for odd {@code b}; {@code 1000·G^((2x+1)/(2b))} for
 * even {@code b}), band edges {@code f_1 = f_m·G^(-1/(2b))} and {@code f_2 = f_m·G^(1/(2b))}.
 */
public final class OctaveBands {

    /** The base-ten octave ratio {@code G = 10^(3/10) ≈ 1.99526}. */
    public static final double G = Math.pow(10.0, 0.3);

    private OctaveBands() {
    }

    /**
     * Exact mid-band frequency of band index {@code x} of the 1/b-octave series.
     *
     * @param x band index (0 is the band at or just above 1 kHz)
     * @param bandwidthDesignator {@code b} (1 for octaves, 3 for third-octaves), {@code >= 1}
     */
    public static double midBandHz(int x, int bandwidthDesignator) {
        requireDesignator(bandwidthDesignator);
        double b = bandwidthDesignator;
        return bandwidthDesignator % 2 == 1 ? 1000.0 * Math.pow(G, x / b) : 1000.0 * Math.pow(G, (2.0 * x + 1) / (2 * b));
    }

    /** Lower band edge {@code f_m·G^(-1/(2b))}. */
    public static double lowerEdgeHz(double midBandHz, int bandwidthDesignator) {
        requireDesignator(bandwidthDesignator);
        return midBandHz * Math.pow(G, -1.0 / (2.0 * bandwidthDesignator));
    }

    /** Upper band edge {@code f_m·G^(1/(2b))}. */
    public static double upperEdgeHz(double midBandHz, int bandwidthDesignator) {
        requireDesignator(bandwidthDesignator);
        return midBandHz * Math.pow(G, 1.0 / (2.0 * bandwidthDesignator));
    }

    private static void requireDesignator(int b) {
        if (b < 1) {
            throw new IllegalArgumentException("bandwidth designator must be >= 1: " + b);
        }
    }
}
