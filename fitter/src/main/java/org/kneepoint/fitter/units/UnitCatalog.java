package org.kneepoint.fitter.units;

import static org.kneepoint.fitter.units.Dimension.AREA;
import static org.kneepoint.fitter.units.Dimension.DENSITY;
import static org.kneepoint.fitter.units.Dimension.ENERGY_PRODUCT;
import static org.kneepoint.fitter.units.Dimension.FIELD_STRENGTH;
import static org.kneepoint.fitter.units.Dimension.FLUX_DENSITY;
import static org.kneepoint.fitter.units.Dimension.LENGTH;
import static org.kneepoint.fitter.units.Dimension.MAGNETIZATION;
import static org.kneepoint.fitter.units.Dimension.MASS_SUSCEPTIBILITY;
import static org.kneepoint.fitter.units.Dimension.MOLAR_MASS;
import static org.kneepoint.fitter.units.Dimension.MOLAR_SUSCEPTIBILITY;
import static org.kneepoint.fitter.units.Dimension.TEMPERATURE;
import static org.kneepoint.fitter.units.Dimension.VOLUME;
import static org.kneepoint.fitter.units.Dimension.VOLUME_SUSCEPTIBILITY;

import java.util.List;
import java.util.Optional;

/**
 * Every unit Kneepoint understands, with its SI factor.
 *
 * <p>Factors: NIST Special Publication 811 (A. Thompson, B. N. Taylor, 2008), Appendix B.8 and
 * B.9 — 1 Oe = 1000/(4π) A/m, 1 G = 1e-4 T, 1 in = 0.0254 m (so 1 in² = 6.4516e-4 m²), t/°C = T/K − 273.15,
 * t/°F = 1.8·t/°C + 32 — and the CGS–SI table for magnetic quantities ("Units for magnetic
 * properties", IEEE Trans. Magn. author guide, Table I): 1 emu/cm³ = 1e3 A/m; 1 MGOe =
 * 100/(4π) kJ/m³; volume susceptibility χ_SI = 4π·χ_CGS; mass 1 cm³/g = 4π·1e-3 m³/kg; molar
 * 1 cm³/mol = 4π·1e-6 m³/mol; in CGS emu/Oe = cm³, so emu/(g·Oe) is cm³/g and emu/(mol·Oe) is cm³/mol.
 * emu/g and emu/mol are moments per mass or per mole (a magnetization), not susceptibilities, and
 * are refused as such (see {@link UnitMessages}). Matching is exact (case-sensitive): "mA/m" and "MA/m" differ by
 * nine orders of magnitude, so no case is ever guessed.
 */
public final class UnitCatalog {

    private static final double OERSTED = 1000.0 / (4.0 * Math.PI);
    private static final double FOUR_PI = 4.0 * Math.PI;

    private static final List<Unit> UNITS = List.of(
            Unit.of("T", FLUX_DENSITY, 1.0, "tesla", "Tesla"),
            Unit.of("mT", FLUX_DENSITY, 1e-3, "millitesla"),
            Unit.of("G", FLUX_DENSITY, 1e-4, "Gs", "gauss", "Gauss"),
            Unit.of("kG", FLUX_DENSITY, 0.1, "kGs", "kilogauss"),
            Unit.of("A/m", FIELD_STRENGTH, 1.0, "A m^-1", "A·m⁻¹"),
            Unit.of("kA/m", FIELD_STRENGTH, 1e3, "kA m^-1", "kA·m⁻¹"),
            Unit.of("MA/m", FIELD_STRENGTH, 1e6, "MA m^-1", "MA·m⁻¹"),
            Unit.of("Oe", FIELD_STRENGTH, OERSTED, "oersted", "Oersted"),
            Unit.of("kOe", FIELD_STRENGTH, 1e3 * OERSTED, "kilooersted"),
            Unit.of("A/m", MAGNETIZATION, 1.0, "A m^-1", "A·m⁻¹"),
            Unit.of("kA/m", MAGNETIZATION, 1e3, "kA m^-1", "kA·m⁻¹"),
            Unit.of("MA/m", MAGNETIZATION, 1e6, "MA m^-1", "MA·m⁻¹"),
            Unit.of("emu/cm³", MAGNETIZATION, 1e3, "emu/cm3", "emu/cc"),
            Unit.of("J/m³", ENERGY_PRODUCT, 1.0, "J/m3"),
            Unit.of("kJ/m³", ENERGY_PRODUCT, 1e3, "kJ/m3"),
            Unit.of("MGOe", ENERGY_PRODUCT, 1e5 / FOUR_PI, "MG·Oe"),
            Unit.of("m", LENGTH, 1.0, "metre", "meter"),
            Unit.of("cm", LENGTH, 1e-2),
            Unit.of("mm", LENGTH, 1e-3),
            Unit.of("µm", LENGTH, 1e-6, "um", "μm"),
            Unit.of("in", LENGTH, 0.0254, "inch"),
            Unit.of("K", TEMPERATURE, 1.0, "kelvin"),
            new Unit("°C", TEMPERATURE, 1.0, 273.15, List.of("C", "degC", "℃", "celsius")),
            new Unit("°F", TEMPERATURE, 5.0 / 9.0, 459.67 * 5.0 / 9.0, List.of("F", "degF", "℉", "fahrenheit")),
            Unit.of("SI", VOLUME_SUSCEPTIBILITY, 1.0, "si", "1"),
            Unit.of("emu/cm³", VOLUME_SUSCEPTIBILITY, FOUR_PI, "emu/cm3", "cgs", "CGS"),
            Unit.of("m³/kg", MASS_SUSCEPTIBILITY, 1.0, "m3/kg"),
            Unit.of("cm³/g", MASS_SUSCEPTIBILITY, FOUR_PI * 1e-3, "cm3/g", "emu/(g·Oe)", "emu/(g Oe)", "emu/g/Oe"),
            Unit.of("m³/mol", MOLAR_SUSCEPTIBILITY, 1.0, "m3/mol"),
            Unit.of("cm³/mol", MOLAR_SUSCEPTIBILITY, FOUR_PI * 1e-6, "cm3/mol", "emu/(mol·Oe)", "emu/(mol Oe)",
                    "emu/mol/Oe"),
            Unit.of("kg/m³", DENSITY, 1.0, "kg/m3"),
            Unit.of("g/cm³", DENSITY, 1e3, "g/cm3", "g/cc"),
            Unit.of("kg/mol", MOLAR_MASS, 1.0),
            Unit.of("g/mol", MOLAR_MASS, 1e-3),
            Unit.of("m²", AREA, 1.0, "m2"),
            Unit.of("cm²", AREA, 1e-4, "cm2"),
            Unit.of("mm²", AREA, 1e-6, "mm2"),
            Unit.of("in²", AREA, 0.0254 * 0.0254, "in2"),
            Unit.of("m³", VOLUME, 1.0, "m3"),
            Unit.of("cm³", VOLUME, 1e-6, "cm3", "cc"),
            Unit.of("mm³", VOLUME, 1e-9, "mm3"),
            Unit.of("in³", VOLUME, 0.0254 * 0.0254 * 0.0254, "in3"));

    private UnitCatalog() {
    }

    /** The unit of the given dimension written as {@code text}, if there is one. */
    public static Optional<Unit> find(String text, Dimension dimension) {
        return UNITS.stream()
                .filter(unit -> unit.dimension() == dimension && unit.isWrittenAs(text))
                .findFirst();
    }

    /** The dimension a unit symbol belongs to, whatever was expected (for helpful messages). */
    public static Optional<Dimension> dimensionOf(String text) {
        return UNITS.stream().filter(unit -> unit.isWrittenAs(text)).map(Unit::dimension).findFirst();
    }

    /** The SI unit of a dimension. */
    public static Unit si(Dimension dimension) {
        return find(dimension.siSymbol(), dimension).orElseThrow();
    }

    /** Looks a unit up by one of its spellings; throws a message naming what was expected. */
    public static Unit require(String text, Dimension dimension) {
        return find(text.strip(), dimension).orElseThrow(() -> new IllegalArgumentException(
                UnitMessages.unknownUnit(text.strip(), dimension)));
    }
}
