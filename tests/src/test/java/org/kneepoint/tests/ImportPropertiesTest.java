package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import java.util.function.UnaryOperator;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.kneepoint.db.DatabaseLocation;
import org.kneepoint.db.Library;
import org.kneepoint.fitter.curve.DemagnetizationCurve;

/**
 * Randomized checks of import, seeded so every run tries the same files: random valid files are
 * stored exactly; one mutation of a valid file is refused with its line, and no table gains a row.
 */
class ImportPropertiesTest {

    @TempDir
    Path folder;

    private Library open() {
        return Library.open(DatabaseLocation.ofFolder(folder.resolve("library")));
    }

    @Test
    void random_valid_files_are_stored_exactly_as_written() throws IOException {
        SplittableRandom random = new SplittableRandom(20261202);
        for (int index = 0; index < 40; index++) {
            RandomCurveFiles.Generated generated = RandomCurveFiles.generate(random, index);
            Path file = folder.resolve("valid-" + index + ".csv");
            Files.writeString(file, generated.text());
            CliRun run = CliRun.of("import", file.toString(), "--db", folder.resolve("library").toString());
            assertEquals(0, run.exitCode(), generated.text() + run.err());
            try (Library library = open()) {
                DemagnetizationCurve stored = library.reader().curves(generated.grade()).get(0).curve();
                assertEquals(generated.temperatureK(), stored.temperatureK(), 1e-9);
                double[] h = stored.h();
                double[] values = stored.values();
                for (int i = 0; i < h.length; i++) {
                    assertEquals(generated.h()[i], h[i], 1e-12 * Math.abs(h[i]) + 1e-300, generated.text());
                    assertEquals(generated.values()[i], values[i], 1e-12 * Math.abs(values[i]) + 1e-300, generated.text());
                }
            }
        }
    }

    /** A change that makes a valid file invalid, applied to one line chosen by the random source. */
    private record Mutation(String name, UnaryOperator<List<String>> apply) {
    }

    private static List<Mutation> mutations(SplittableRandom random) {
        return List.of(
                new Mutation("a number becomes NaN", lines -> replaceCell(lines, random, "NaN")),
                new Mutation("a number becomes text", lines -> replaceCell(lines, random, "twelve")),
                new Mutation("a cell is emptied", lines -> replaceCell(lines, random, "")),
                new Mutation("a number overflows", lines -> replaceCell(lines, random, "1e400")),
                new Mutation("a hexadecimal number", lines -> replaceCell(lines, random, "0x1F")),
                new Mutation("a cell is added", lines -> edit(lines, dataLine(lines, random), line -> line + delimiterOf(lines) + "1")),
                new Mutation("the unit is unknown", lines -> edit(lines, headerLine(lines), line -> line.replaceFirst("\\[[^]]*]", "[furlong]"))),
                new Mutation("H is given in tesla", lines -> edit(lines, headerLine(lines), line -> line.replaceFirst("H \\[[^]]*]", "H [T]"))),
                new Mutation("metadata after the header", lines -> insert(lines, headerLine(lines) + 1, "# notes: too late")),
                new Mutation("an unknown metadata key", lines -> insert(lines, 0, "# colour: red")),
                new Mutation("the temperature has no unit", lines -> edit(lines, lines.indexOf(lines.stream()
                        .filter(line -> line.startsWith("# temperature:")).findFirst().orElseThrow()), line -> "# temperature: 20")));
    }

    @Test
    void every_mutation_of_a_valid_file_is_refused_with_its_line_and_writes_nothing() throws IOException {
        SplittableRandom random = new SplittableRandom(42);
        String db = folder.resolve("library").toString();
        Path seedFile = folder.resolve("seed.csv");
        Files.writeString(seedFile, RandomCurveFiles.generate(random, 1000).text());
        assertEquals(0, CliRun.of("import", seedFile.toString(), "--db", db).exitCode());
        Map<String, Integer> before;
        try (Library library = open()) {
            before = library.reader().rowCounts();
        }
        int tried = 0;
        for (int round = 0; round < 4; round++) {
            for (Mutation mutation : mutations(random)) {
                String valid = RandomCurveFiles.generate(random, 2000 + tried).text();
                List<String> lines = mutation.apply().apply(new java.util.ArrayList<>(valid.lines().toList()));
                Path file = folder.resolve("mutated-" + tried++ + ".csv");
                Files.writeString(file, String.join("\n", lines) + "\n");
                CliRun run = CliRun.of("import", file.toString(), "--db", db);
                assertEquals(2, run.exitCode(), mutation.name() + "\n" + String.join("\n", lines));
                assertTrue(run.err().matches("(?s)kneepoint: mutated-\\d+\\.csv, line \\d+.*"), mutation.name() + ": " + run.err());
                assertEquals(1, run.err().strip().lines().count(), run.err());
            }
        }
        try (Library library = open()) {
            assertEquals(before, library.reader().rowCounts());
        }
    }

    private static int headerLine(List<String> lines) {
        for (int i = 0; i < lines.size(); i++) {
            if (!lines.get(i).isBlank() && !lines.get(i).startsWith("#")) {
                return i;
            }
        }
        throw new IllegalStateException("no header");
    }

    private static int dataLine(List<String> lines, SplittableRandom random) {
        int header = headerLine(lines);
        int line;
        do {
            line = header + 1 + random.nextInt(lines.size() - header - 1);
        } while (lines.get(line).isBlank() || lines.get(line).startsWith("#"));
        return line;
    }

    private static String delimiterOf(List<String> lines) {
        String header = lines.get(headerLine(lines));
        return header.contains("\t") ? "\t" : header.contains(";") ? ";" : ",";
    }

    private static List<String> replaceCell(List<String> lines, SplittableRandom random, String replacement) {
        int line = dataLine(lines, random);
        String delimiter = delimiterOf(lines);
        String[] cells = lines.get(line).split(java.util.regex.Pattern.quote(delimiter), -1);
        cells[random.nextInt(cells.length)] = replacement;
        lines.set(line, String.join(delimiter, cells));
        return lines;
    }

    private static List<String> edit(List<String> lines, int index, UnaryOperator<String> change) {
        lines.set(index, change.apply(lines.get(index)));
        return lines;
    }

    private static List<String> insert(List<String> lines, int index, String line) {
        lines.add(index, line);
        return lines;
    }
}
