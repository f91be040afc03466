package org.kneepoint.importer.csv;

import java.nio.file.Path;
import org.kneepoint.importer.input.InputFile;

/**
 * Reads a susceptibility table: metadata ({@code material} required; {@code density},
 * {@code molar-mass}, {@code source}, {@code notes}), a header with a temperature column and a
 * {@code chi} (or {@code χ}) column whose unit gives the form — {@code SI} or {@code cgs} per
 * volume, {@code m³/kg} or {@code cm³/g} per mass, {@code m³/mol} or {@code cm³/mol} per mole —
 * and rows of numbers, each temperature and χ within its plausible range.
 */
public final class SusceptibilityFileReader {

    private final ReadLimits limits;

    public SusceptibilityFileReader(ReadLimits limits) {
        this.limits = limits;
    }

    /** Reads a table from disk after checking its size against the limit. */
    public SusceptibilityTable read(Path path) {
        InputFile file = InputFile.load(path, limits.maxBytes());
        SusceptibilityCollector collector = new SusceptibilityCollector(file.source());
        TableScanner.scan(file.source(), file.text(), collector);
        return collector.result();
    }
}
