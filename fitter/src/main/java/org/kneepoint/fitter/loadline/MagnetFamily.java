package org.kneepoint.fitter.loadline;

import java.util.Locale;
import java.util.Optional;

/**
 * Families of permanent-magnet material and the Curie temperature of each, the temperature no model of a grade
 * may run past (the magnet has no spontaneous magnetization above it). Values and their sources:
 * <ul>
 * <li>NdFeB (sintered or bonded): Nd2Fe14B, Tc ≈ 585 K — J. F. Herbst, "R2Fe14B materials: intrinsic properties and
 * technological aspects", Rev. Mod. Phys. 63, 819 (1991), §IV.A.2 (the review located by search, the number from
 * memory); supplier tables give 310–400 °C, the upper values for cobalt-substituted grades.</li>
 * <li>SmCo5: ≈ 1020 K (747 °C) — from memory; supplier tables found by search give 720–750 °C.</li>
 * <li>Sm2Co17 (and SmCo not named further, taking the higher of the two): ≈ 1193 K (920 °C) — C.-B. Jiang,
 * S.-Z. An, "Recent progress in high temperature permanent magnetic materials", Rare Metals 32 (2013): SmCo
 * alloys 720–920 °C (abstract found by search); supplier tables give 800–825 °C.</li>
 * <li>Hard ferrite (Ba or Sr hexaferrite): ≈ 750 K — from memory BaFe12O19 ≈ 723 K, SrFe12O19 ≈ 733–750 K;
 * supplier tables found by search give 450–460 °C.</li>
 * <li>AlNiCo: ≈ 1133 K (860 °C) — supplier tables found by search give 700–860 °C; the upper value.</li>
 * </ul>
 */
public enum MagnetFamily {
    NDFEB("NdFeB", 585.0),
    SMCO5("SmCo5", 1020.0),
    SM2CO17("Sm2Co17", 1193.0),
    HARD_FERRITE("hard ferrite", 750.0),
    ALNICO("AlNiCo", 1133.0);

    private final String label;
    private final double curieTemperature;

    MagnetFamily(String label, double curieTemperature) {
        this.label = label;
        this.curieTemperature = curieTemperature;
    }

    /** The family's name in words. */
    public String label() {
        return label;
    }

    /** Tc, K. */
    public double curieTemperature() {
        return curieTemperature;
    }

    /**
     * The family a stored family name such as "sintered NdFeB", "hard ferrite", "cast AlNiCo" or "SmCo 2:17"
     * names, or empty when it names none of them. "SmCo" alone is taken as Sm2Co17, the higher Curie temperature.
     */
    public static Optional<MagnetFamily> recognize(String name) {
        if (name == null) {
            return Optional.empty();
        }
        String text = name.toLowerCase(Locale.ROOT).replace(" ", "").replace("-", "");
        if (text.contains("ndfeb") || text.contains("neodymium")) {
            return Optional.of(NDFEB);
        }
        if (text.contains("smco5") || text.contains("smco1:5") || text.contains("1:5")) {
            return Optional.of(SMCO5);
        }
        if (text.contains("smco") || text.contains("sm2co17") || text.contains("samarium")) {
            return Optional.of(SM2CO17);
        }
        if (text.contains("ferrite") || text.contains("ceramic")) {
            return Optional.of(HARD_FERRITE);
        }
        if (text.contains("alnico")) {
            return Optional.of(ALNICO);
        }
        return Optional.empty();
    }
}
