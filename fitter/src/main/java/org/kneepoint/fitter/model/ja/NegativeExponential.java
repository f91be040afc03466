package org.kneepoint.fitter.model.ja;

import java.math.BigDecimal;
import java.math.MathContext;

/**
 * exp(−t) for t ≥ 0 with a short dependency chain, for the Langevin function inside the
 * integrators, whose speed is bound by the latency of one exponential per stage. Table-driven
 * reduction (P. T. P. Tang, "Table-driven implementation of the exponential function in IEEE
 * floating-point arithmetic", ACM Trans. Math. Softw. 15(2), 144–157, 1989): −t = k·ln2/256 + r
 * with k the nearest integer, so exp(−t) = 2^⌊k/256⌋ · 2^((k mod 256)/256) · exp(r) and
 * |r| ≤ ln2/512. ln2 is split in the two parts of fdlibm's e_exp.c, so k·ln2 loses nothing; the
 * 256 powers 2^(j/256) are correctly rounded (from 40-digit decimal arithmetic); exp(r) is its
 * Taylor polynomial of degree 4 (truncation below 4e-17 relative) by Estrin's scheme. The result
 * is within 3 ulp of StrictMath.exp(−t) (checked over the whole range; fdlibm's exp is itself within
 * 1 ulp), about 7e-16 relative: far below the integrators' 1e-6. For t &gt; {@value #ZERO_BEYOND} it returns 0 (the true value
 * is below 1e-307, and the model only adds it to numbers of order one or multiplies it by x² &lt; 1e13).
 */
final class NegativeExponential {

    static final double ZERO_BEYOND = 708;

    private static final int TABLE_BITS = 8;
    private static final int TABLE_SIZE = 1 << TABLE_BITS;
    private static final double LN2_HIGH = 6.93147180369123816490e-01 / TABLE_SIZE;
    private static final double LN2_LOW = 1.90821492927058770002e-10 / TABLE_SIZE;
    private static final double STEPS_PER_UNIT = TABLE_SIZE / Math.log(2);
    /** 1.5·2^52: adding it rounds a number below 2^51 in magnitude to an integer kept in the low bits. */
    private static final double SHIFTER = 0x1.8p52;
    private static final long SHIFTER_BITS = Double.doubleToRawLongBits(SHIFTER);
    private static final double[] POWERS = powersOfTwo();

    private NegativeExponential() {
    }

    /** exp(−t) for finite t ≥ 0. */
    static double of(double t) {
        if (t > ZERO_BEYOND) {
            return 0;
        }
        double shifted = -t * STEPS_PER_UNIT + SHIFTER;
        long k = Double.doubleToRawLongBits(shifted) - SHIFTER_BITS;
        double steps = shifted - SHIFTER;
        double r = Math.fma(steps, -LN2_HIGH, -t) - steps * LN2_LOW;
        double scale = Double.longBitsToDouble(((k >> TABLE_BITS) + 1023) << 52) * POWERS[(int) (k & (TABLE_SIZE - 1))];
        double r2 = r * r;
        return scale * Math.fma(r2, Math.fma(r2, 1.0 / 24, Math.fma(r, 1.0 / 6, 0.5)), 1 + r);
    }

    /** 2^(j/256), j = 0 … 255: the 256th root of 2 by eight square roots, then its powers, to 40 digits. */
    private static double[] powersOfTwo() {
        MathContext digits = new MathContext(40);
        BigDecimal root = BigDecimal.valueOf(2);
        for (int i = 0; i < TABLE_BITS; i++) {
            root = root.sqrt(digits);
        }
        double[] powers = new double[TABLE_SIZE];
        BigDecimal power = BigDecimal.ONE;
        for (int j = 0; j < TABLE_SIZE; j++) {
            powers[j] = power.doubleValue();
            power = power.multiply(root, digits);
        }
        return powers;
    }
}
