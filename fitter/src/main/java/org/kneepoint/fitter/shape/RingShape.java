package org.kneepoint.fitter.shape;

/**
 * A ring (hollow cylinder) magnetized along its axis z, centred at the origin. Built by
 * superposition: the ring is an outer cylinder of magnetization M plus an inner one of −M. With
 * Va, Vc the two volumes and Q the mutual terms of CoaxialCylinderInteraction:
 * Nm·V = Nm(a)·Va + Nm(c)·Vc − 2·Q(L); Nf·A = Nf(a)·Aa + Nf(c)·Ac − 2·Q'(L/2) over the annulus A;
 * both follow from the energy and the mid-plane flux of the face charges (derived here; cylinder
 * factors from the closed forms of CylinderDemagnetization, Chen, Brug, Goldfarb 1991). The geometric centre
 * lies in the bore, so N0 is taken on the mid-plane at the mean radius (a + c)/2, from the
 * Derby–Olbert field (Am. J. Phys. 78, 229, 2010). Accepted: inner/outer diameter
 * {@value #MIN_BORE_RATIO} to {@value #MAX_BORE_RATIO}, length/outer diameter at least
 * {@value CylinderShape#MIN_ASPECT} and length/inner diameter at most {@value CylinderShape#MAX_ASPECT}.
 *
 * @param outerDiameter in metres
 * @param innerDiameter bore, in metres, smaller than the outer diameter
 * @param length        along the magnetization, in metres
 */
public record RingShape(double outerDiameter, double innerDiameter, double length) implements FlatPoleShape {

    /** Smallest accepted inner/outer diameter (a smaller bore: use a cylinder). */
    public static final double MIN_BORE_RATIO = 1e-3;
    /** Largest accepted inner/outer diameter. */
    public static final double MAX_BORE_RATIO = 0.99;

    public RingShape {
        SizeChecks.positiveLength("outer diameter", outerDiameter);
        SizeChecks.positiveLength("inner diameter", innerDiameter);
        SizeChecks.positiveLength("length", length);
        SizeChecks.ratioWithin("ring inner/outer diameter", innerDiameter / outerDiameter, MIN_BORE_RATIO, MAX_BORE_RATIO);
        SizeChecks.ratioAtLeast("ring length/outer diameter", length / outerDiameter, CylinderShape.MIN_ASPECT);
        SizeChecks.ratioAtMost("ring length/inner diameter", length / innerDiameter, CylinderShape.MAX_ASPECT);
    }

    @Override
    public DemagnetizingFactors demagnetizingFactors() {
        double a = 0.5 * outerDiameter;
        double c = 0.5 * innerDiameter;
        double areaOuter = Math.PI * a * a;
        double areaInner = Math.PI * c * c;
        double area = areaOuter - areaInner;
        double outerAspect = length / outerDiameter;
        double innerAspect = length / innerDiameter;
        double magnetometric = (CylinderDemagnetization.magnetometric(outerAspect) * areaOuter * length
                + CylinderDemagnetization.magnetometric(innerAspect) * areaInner * length
                - 2.0 * CoaxialCylinderInteraction.energyTerm(a, c, length)) / (area * length);
        double fluxmetric = (CylinderDemagnetization.fluxmetric(outerAspect) * areaOuter
                + CylinderDemagnetization.fluxmetric(innerAspect) * areaInner
                - 2.0 * CoaxialCylinderInteraction.midPlaneFlux(a, c, 0.5 * length)) / area;
        double meanRadius = 0.5 * (a + c);
        double halfLength = 0.5 * length;
        double bzOverBr = 2.0 / Math.PI
                * (DerbyOlbertTerms.axial(a, meanRadius, halfLength) - DerbyOlbertTerms.axial(c, meanRadius, halfLength));
        return new DemagnetizingFactors(magnetometric, fluxmetric, 1.0 - bzOverBr);
    }

    @Override
    public double volume() {
        return 0.25 * Math.PI * (outerDiameter * outerDiameter - innerDiameter * innerDiameter) * length;
    }

    @Override
    public double lengthAlongMagnetization() {
        return length;
    }

    @Override
    public RingShape withLengthAlongMagnetization(double newLength) {
        return new RingShape(outerDiameter, innerDiameter, newLength);
    }
}
