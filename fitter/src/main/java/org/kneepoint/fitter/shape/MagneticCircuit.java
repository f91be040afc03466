package org.kneepoint.fitter.shape;

import org.kneepoint.fitter.error.BadInputException;

/**
 * A simple magnetic circuit: a magnet of length Lm and pole area Am driving flux through soft iron
 * and an air gap of length Lg and area Ag. With the leakage factor σ ≥ 1 (Bm·Am = σ·Bg·Ag) and the
 * reluctance factor f ≥ 1 (Hm·Lm = f·Hg·Lg) the load line has Pc = (Lm·Ag)/(Am·Lg)·(σ/f)
 * (common practice: R. J. Parker, Advances in Permanent Magnetism, Wiley 1990; P. Campbell,
 * Permanent Magnet Materials and their Application, CUP 1994; docs/references.md §6c, from memory). Its
 * demagnetizing factors are the equivalent N = 1/(1 + Pc), the same for all three kinds.
 *
 * @param magnetLength    Lm along the magnetization, m
 * @param magnetArea      Am, m²
 * @param gapLength       Lg, m
 * @param gapArea         Ag, m²
 * @param leakageFactor   σ ≥ 1
 * @param reluctanceFactor f ≥ 1
 */
public record MagneticCircuit(double magnetLength, double magnetArea, double gapLength, double gapArea, double leakageFactor,
        double reluctanceFactor) implements MagnetShape {

    public MagneticCircuit {
        SizeChecks.positiveLength("magnet length", magnetLength);
        SizeChecks.positiveLength("gap length", gapLength);
        positiveArea("magnet area", magnetArea);
        positiveArea("gap area", gapArea);
        atLeastOne("leakage factor", leakageFactor);
        atLeastOne("reluctance factor", reluctanceFactor);
    }

    /** Pc = (Lm·Ag)/(Am·Lg)·(σ/f). */
    public double permeanceCoefficient() {
        return magnetLength * gapArea / (magnetArea * gapLength) * (leakageFactor / reluctanceFactor);
    }

    @Override
    public DemagnetizingFactors demagnetizingFactors() {
        return DemagnetizingFactors.uniform(1.0 / (1.0 + permeanceCoefficient()));
    }

    @Override
    public double volume() {
        return magnetLength * magnetArea;
    }

    private static void positiveArea(String name, double value) {
        if (!(value > 0.0) || !Double.isFinite(value)) {
            throw new BadInputException(name + " must be a positive finite area in square metres, got " + value);
        }
    }

    private static void atLeastOne(String name, double value) {
        if (!(value >= 1.0) || !Double.isFinite(value)) {
            throw new BadInputException(name + " must be a finite number of at least 1, got " + value);
        }
    }
}
