package org.kneepoint.fitter.units;

/**
 * The kinds of quantity Kneepoint reads and writes, each with its SI unit and an example used in
 * error messages ("expected a field strength such as 955 kA/m or 12 kOe").
 */
public enum Dimension {
    FLUX_DENSITY("flux density", "T", "1.2 T or 12 kG"),
    FIELD_STRENGTH("field strength", "A/m", "955 kA/m or 12 kOe"),
    MAGNETIZATION("magnetization", "A/m", "950 kA/m or 950 emu/cm³"),
    ENERGY_PRODUCT("energy product", "J/m³", "350 kJ/m³ or 44 MGOe"),
    LENGTH("length", "m", "10 mm or 0.5 in"),
    TEMPERATURE("temperature", "K", "20 °C or 293.15 K"),
    VOLUME_SUSCEPTIBILITY("volume susceptibility", "SI", "-9.04e-6 SI or -7.19e-7 emu/cm³"),
    MASS_SUSCEPTIBILITY("mass susceptibility", "m³/kg", "-9.0e-9 m³/kg or -7.2e-7 cm³/g"),
    MOLAR_SUSCEPTIBILITY("molar susceptibility", "m³/mol", "-1.6e-10 m³/mol or -12.97e-6 cm³/mol"),
    DENSITY("density", "kg/m³", "7500 kg/m³ or 7.5 g/cm³"),
    MOLAR_MASS("molar mass", "kg/mol", "0.018 kg/mol or 18 g/mol"),
    AREA("area", "m²", "1.5 cm² or 0.25 in²"),
    VOLUME("volume", "m³", "2.5 mm³ or 0.1 cm³");

    private final String description;
    private final String siSymbol;
    private final String examples;

    Dimension(String description, String siSymbol, String examples) {
        this.description = description;
        this.siSymbol = siSymbol;
        this.examples = examples;
    }

    /** Plain words for the quantity, e.g. "field strength". */
    public String description() {
        return description;
    }

    /** Symbol of the SI unit every value of this dimension is held in inside the program. */
    public String siSymbol() {
        return siSymbol;
    }

    /** "a field strength such as 955 kA/m or 12 kOe", for messages. */
    public String expectation() {
        return article(description) + " " + description + " such as " + examples;
    }

    private static String article(String word) {
        return "aeiou".indexOf(word.charAt(0)) >= 0 ? "an" : "a";
    }
}
