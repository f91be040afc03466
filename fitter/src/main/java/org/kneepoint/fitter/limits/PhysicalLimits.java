package org.kneepoint.fitter.limits;

import org.kneepoint.fitter.units.SusceptibilityForm;

/**
 * What no known material or instrument reaches, in SI: a value outside these ranges is a mistake
 * in the data (a wrong unit, a slipped decimal point, a damaged file), never a measurement. The
 * limits are deliberately wide — they stop nonsense, not unusual materials. Each names its basis;
 * docs/references.md §9 lists them with their provenance.
 */
public final class PhysicalLimits {

    /**
     * Polarization |J| at or above {@link #CRYOGENIC_BELOW_K}: at most 3 T. The highest saturation
     * polarization of any bulk material at room temperature is that of Fe–Co alloys near
     * Fe65Co35, about 2.45 T (R. M. Bozorth, Ferromagnetism, Van Nostrand, 1951, the Fe–Co
     * chapter — from memory); the equiatomic Fe–Co–V alloys reach about 2.4 T, "the highest of
     * any commercially available metal" (Wikipedia, "Permendur" — read, secondary). Thin films of Fe16N2
     * were reported at 2050 emu/cm³, μ0·Ms ≈ 2.58 T (T. K. Kim, M. Takahashi, "New magnetic
     * material having ultrahigh magnetic moment", Appl. Phys. Lett. 20, 492 (1972) — abstract read,
     * journal details from memory; the claim is disputed); 3 T sits above all of these.
     */
    public static final PlausibleRange POLARIZATION = new PlausibleRange(-3.0, 3.0, "T");

    /**
     * Polarization |J| below {@link #CRYOGENIC_BELOW_K} or at an unknown temperature: at most 4 T.
     * The heavy rare-earth metals order ferromagnetically only well below room temperature and then
     * exceed Fe–Co: dysprosium and holmium near 4 K reach μ0·Ms ≈ 3.7–3.8 T, the highest of any
     * element (J. M. D. Coey, Magnetism and Magnetic Materials, Cambridge University Press, 2010,
     * table of the rare-earth metals — from memory).
     */
    public static final PlausibleRange POLARIZATION_CRYOGENIC = new PlausibleRange(-4.0, 4.0, "T");

    /**
     * Below this temperature (K) a rare-earth metal may be ferromagnetic: terbium orders at about
     * 220–230 K and gadolinium, whose polarization stays below 3 T, at 293 K (Gimaev et al.,
     * "Magnetic and Electronic Properties of Heavy Lanthanides", Crystals 11, 82 (2021) — from
     * memory).
     */
    public static final double CRYOGENIC_BELOW_K = 250.0;

    /**
     * Field strength |H|: at most 1e8 A/m (μ0·H ≈ 126 T). The strongest non-destructive pulsed
     * magnet passed 100 T in March 2012 (US National High Magnetic Field Laboratory, Los Alamos;
     * Physics Today 65(5), 30 (2012), "Magnetic record" — abstract read); hysteresigraphs and
     * pulsed-field magnetometers for permanent magnets apply far less.
     */
    public static final PlausibleRange FIELD_STRENGTH = new PlausibleRange(-1.0e8, 1.0e8, "A/m");

    /**
     * Temperature of a demagnetization curve or loop: from 1 µK to 1500 K. No material keeps a
     * spontaneous magnetization above the Curie temperature of cobalt, the highest of any element,
     * quoted as 1388 K to 1404 K (1115–1131 °C) in different tables (encyclopedia tables of Curie
     * points — read, secondary); 1 µK is below what nuclear-demagnetization cryostats reach (from
     * memory).
     */
    public static final PlausibleRange CURVE_TEMPERATURE = new PlausibleRange(1.0e-6, 1500.0, "K");

    /**
     * Temperature of a susceptibility point: from 1 µK to 4000 K. Susceptibilities are also measured
     * above the Curie temperature, up to the melting point; the highest melting point of a metal
     * is that of tungsten, 3695 K (CRC Handbook of Chemistry and Physics — from memory).
     */
    public static final PlausibleRange SUSCEPTIBILITY_TEMPERATURE = new PlausibleRange(1.0e-6, 4000.0, "K");

    /**
     * Density of a solid: from 0.1 to 23,000 kg/m³. The densest element is osmium, 22,590 kg/m³
     * (CRC Handbook of Chemistry and Physics — from memory); the lightest solids, aerogels, come
     * down to about 0.16 kg/m³ (from memory). Magnet grades lie between about 1,500 (bonded) and
     * 8,900 kg/m³ (common practice).
     */
    public static final PlausibleRange DENSITY = new PlausibleRange(0.1, 23_000.0, "kg/m³");

    /**
     * Molar mass: from 1 g/mol (hydrogen, 1.008 g/mol, the lightest atom — IUPAC standard atomic
     * weights, from memory) to 1000 kg/mol (above large metal-protein complexes such as ferritin,
     * about 450 kg/mol — from memory).
     */
    public static final PlausibleRange MOLAR_MASS = new PlausibleRange(1.0e-3, 1000.0, "kg/mol");

    /**
     * SI volume susceptibility: from −1 to 1e6. χ = −1 is perfect diamagnetism (μ = μ0·(1 + χ)
     * cannot be negative — the definition); the highest relative permeabilities of soft alloys
     * are about 1e6 (from memory).
     */
    public static final PlausibleRange VOLUME_SUSCEPTIBILITY = new PlausibleRange(-1.0, 1.0e6, "");

    /**
     * Longest number written in a data cell, in characters: 40. The shortest text that reads back
     * to any double has at most 24 characters ("-2.2250738585072014E-308"); 40 leaves room for
     * leading zeros. A longer number is not a measurement (common practice).
     */
    public static final int NUMBER_LENGTH = 40;

    private PhysicalLimits() {
    }

    /** The polarization range at a temperature in kelvin (null when the temperature is not known). */
    public static PlausibleRange polarization(Double temperatureK) {
        return temperatureK != null && temperatureK >= CRYOGENIC_BELOW_K ? POLARIZATION : POLARIZATION_CRYOGENIC;
    }

    /**
     * True when an SI susceptibility of the given form is plausible: converted to volume with the
     * material's density (and molar mass) when they are known, else with the ones that allow the
     * most (the lightest solid, the heaviest molar mass).
     */
    public static boolean plausibleSusceptibility(double chi, SusceptibilityForm form, Double density, Double molarMass) {
        double rho = density != null ? density : DENSITY.min();
        double volume = switch (form) {
            case VOLUME -> chi;
            case MASS -> chi * rho;
            case MOLAR -> chi * rho / (molarMass != null ? molarMass : MOLAR_MASS.max());
        };
        return VOLUME_SUSCEPTIBILITY.contains(volume);
    }
}
