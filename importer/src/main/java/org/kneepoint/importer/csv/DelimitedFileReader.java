package org.kneepoint.importer.csv;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Reads a delimited text file of either kind in one pass, choosing by its header row: a
 * {@code chi} (or {@code χ}) column makes it a susceptibility table, anything else a curve file.
 * The metadata lines before the header are kept until the header has chosen, then handed on.
 */
public final class DelimitedFileReader {

    private DelimitedFileReader() {
    }

    /** Reads the text of a file; {@code source} names it in messages. */
    public static FileContent read(String source, String text) {
        Choosing choosing = new Choosing(source);
        TableScanner.scan(source, text, choosing);
        return choosing.result();
    }

    /** True when a header row names a susceptibility column. */
    static boolean susceptibilityHeader(String[] cells) {
        for (String cell : cells) {
            String name = cell.strip().toLowerCase(Locale.ROOT);
            if (name.startsWith("chi") || name.startsWith("χ")) {
                return true;
            }
        }
        return false;
    }

    /** Holds the metadata until the header tells which reader's collector gets the file. */
    private static final class Choosing implements TableHandler {
        private final String source;
        private final List<MetadataLine> entries = new ArrayList<>();
        private final List<Integer> lines = new ArrayList<>();
        private CurveTableCollector curves;
        private SusceptibilityCollector table;
        private TableHandler chosen;

        Choosing(String source) {
            this.source = source;
        }

        @Override
        public void metadata(MetadataLine entry, int line) {
            entries.add(entry);
            lines.add(line);
        }

        @Override
        public void header(String[] cells, Delimiter delimiter, int line) {
            if (susceptibilityHeader(cells)) {
                table = new SusceptibilityCollector(source);
                chosen = table;
            } else {
                curves = CurveFileReader.collector(source);
                chosen = curves;
            }
            for (int i = 0; i < entries.size(); i++) {
                chosen.metadata(entries.get(i), lines.get(i));
            }
            chosen.header(cells, delimiter, line);
        }

        @Override
        public void row(String[] cells, int line) {
            chosen.row(cells, line);
        }

        FileContent result() {
            return table != null ? table.result() : curves.result();
        }
    }
}
