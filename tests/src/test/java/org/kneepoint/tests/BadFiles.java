package org.kneepoint.tests;

import java.io.ByteArrayOutputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;
import java.util.function.BiFunction;

/**
 * Seeded bad files made from valid ones: every mutation is chosen so that the result must be
 * refused — a number too large or too long, a unit of the wrong kind, a control or bidirectional
 * character in a name, a delimiter removed or doubled, a letter inside a number, a metadata line
 * repeated or after the header, Br ×100, all-zero data, a curve reversed, a loop flattened, a
 * truncated or unclosed file, bytes that are not UTF-8, trailing content after JSON, a field twice.
 */
final class BadFiles {

    /** A valid file to mutate: its name, its text and what it is. */
    record Base(String name, String text, boolean json, boolean susceptibility, boolean loop) {
    }

    /** A generated bad file: its name, its bytes and the mutation that made it. */
    record Bad(String name, byte[] bytes, String mutation) {
    }

    private static final String[] CONTROL = {"\u0000", "\u0001", "\u0007", "\u001B", "\u007F", "\u0085", "\u202E", "\u202D", "\u2066",
        "\u200F"};
    private static final String[] HUGE = {"1e300", "-1e300", "1" + "0".repeat(5000), "9.9e99999", "123456789012345678901234567890123456789012345"};
    private static final String[] TRAILING = {"x", "{}", "]", "\"extra\"", "{\"grade\": \"again\"}", "0", "true"};

    private BadFiles() {
    }

    /** The {@code index}-th bad file from {@code bases}, its mutation drawn from {@code random}. */
    static Bad generate(SplittableRandom random, int index, List<Base> bases) {
        Base base = bases.get(index % bases.size());
        List<String> names = base.json() ? JsonMutations.NAMES : TextMutations.names(base);
        String mutation = names.get(random.nextInt(names.size()));
        byte[] bytes = base.json() ? JsonMutations.apply(mutation, base.text(), random) : TextMutations.apply(mutation, base, random);
        String extension = base.name().substring(base.name().lastIndexOf('.'));
        return new Bad(String.format(Locale.ROOT, "fuzz-%04d-%s%s", index, mutation, extension), bytes, mutation);
    }

    private static byte[] utf8(String text) {
        return text.getBytes(StandardCharsets.UTF_8);
    }

    /** Mutations of the text form: each works on the lines of a valid file. */
    private static final class TextMutations {

        static List<String> names(Base base) {
            List<String> names = new ArrayList<>(List.of("huge-number", "wrong-unit", "control-in-name", "delimiter-removed",
                    "delimiter-doubled", "letter-in-number", "metadata-twice", "metadata-after-header", "all-zero", "truncated-header",
                    "not-utf8", "unclosed-quote", "unknown-column", "name-removed", "density-1e300", "huge-header-cell"));
            if (!base.susceptibility()) {
                names.add("br-times-100");
                names.add("temperature-1e308");
            }
            if (!base.susceptibility() && !base.loop() && !base.text().contains("T [")) {
                names.add("j-rises-as-h-falls");
            }
            if (base.loop()) {
                names.add("loop-b-zero");
            }
            return names;
        }

        static byte[] apply(String mutation, Base base, SplittableRandom random) {
            List<String> lines = new ArrayList<>(base.text().lines().toList());
            int header = header(lines);
            char delimiter = lines.get(header).contains("\t") ? '\t' : lines.get(header).contains(";") ? ';' : ',';
            int row = header + 1 + random.nextInt(lines.size() - header - 1);
            String[] cells = lines.get(row).split(String.valueOf(delimiter), -1);
            int cell = random.nextInt(cells.length);
            int value = valueColumn(lines.get(header), delimiter);
            switch (mutation) {
                case "huge-number" -> {
                    cells[cell] = HUGE[random.nextInt(HUGE.length)];
                    lines.set(row, String.join(String.valueOf(delimiter), cells));
                }
                case "wrong-unit" -> lines.set(header, wrongUnit(lines.get(header), delimiter));
                case "control-in-name" -> {
                    int name = metadata(lines, base.susceptibility() ? "material" : random.nextBoolean() ? "grade" : "family");
                    String line = lines.get(name);
                    int at = line.indexOf(':') + 2 + random.nextInt(Math.max(1, line.length() - line.indexOf(':') - 2));
                    lines.set(name, line.substring(0, at) + CONTROL[random.nextInt(CONTROL.length)] + line.substring(at));
                }
                case "delimiter-removed" -> lines.set(row, lines.get(row).replaceFirst(java.util.regex.Pattern.quote(String.valueOf(delimiter)), ""));
                case "delimiter-doubled" -> lines.set(row, lines.get(row).replaceFirst(java.util.regex.Pattern.quote(String.valueOf(delimiter)),
                        String.valueOf(delimiter) + delimiter));
                case "letter-in-number" -> {
                    String number = cells[cell];
                    int at = random.nextInt(number.length() + 1);
                    cells[cell] = number.substring(0, at) + "qxz!?@".charAt(random.nextInt(6)) + number.substring(at);
                    lines.set(row, String.join(String.valueOf(delimiter), cells));
                }
                case "metadata-twice" -> {
                    int name = metadata(lines, base.susceptibility() ? "material" : "grade");
                    lines.add(name + 1, lines.get(name));
                }
                case "metadata-after-header" -> lines.add(row + 1, "# notes: written after the header");
                case "all-zero" -> {
                    for (int i = header + 1; i < lines.size(); i++) {
                        if (!lines.get(i).isBlank() && !lines.get(i).startsWith("#")) {
                            lines.set(i, String.join(String.valueOf(delimiter), java.util.Collections.nCopies(cells.length, "0")));
                        }
                    }
                }
                case "truncated-header" -> {
                    List<String> kept = new ArrayList<>(lines.subList(0, header));
                    String line = lines.get(header);
                    kept.add(random.nextBoolean() ? line.substring(0, random.nextInt(line.indexOf(delimiter) + 1)) : line);
                    lines = kept;
                }
                case "not-utf8" -> {
                    byte[] text = utf8(String.join("\n", lines) + "\n");
                    int at = random.nextInt(text.length + 1);
                    ByteArrayOutputStream out = new ByteArrayOutputStream();
                    out.write(text, 0, at);
                    out.write(random.nextBoolean() ? 0xFF : 0xC3);
                    out.write(0x28);
                    out.write(text, at, text.length - at);
                    return out.toByteArray();
                }
                case "unclosed-quote" -> lines.set(row, "\"" + lines.get(row));
                case "unknown-column" -> lines.set(header, "X" + lines.get(header).strip().substring(1));
                case "name-removed" -> lines.remove(metadata(lines, base.susceptibility() ? "material" : "grade"));
                case "density-1e300" -> lines.add(0, "# density: 1e300 kg/m³");
                case "huge-header-cell" -> lines.set(header, "H".repeat(100_000) + lines.get(header));
                case "br-times-100" -> {
                    int first = header + 1;
                    String[] firstCells = lines.get(first).split(String.valueOf(delimiter), -1);
                    firstCells[value] = times100(firstCells[value], delimiter);
                    lines.set(first, String.join(String.valueOf(delimiter), firstCells));
                }
                case "temperature-1e308" -> {
                    int temperature = lines.stream().filter(line -> line.startsWith("# temperature:")).findFirst().map(lines::indexOf).orElse(-1);
                    if (temperature >= 0) {
                        lines.set(temperature, "# temperature: 1e308 K");
                    } else {
                        String[] first = lines.get(header + 1).split(String.valueOf(delimiter), -1);
                        first[0] = "1e308";
                        lines.set(header + 1, String.join(String.valueOf(delimiter), first));
                    }
                }
                case "j-rises-as-h-falls" -> reverseValues(lines, header, delimiter, value);
                case "loop-b-zero" -> {
                    for (int i = header + 1; i < lines.size(); i++) {
                        String[] loopCells = lines.get(i).split(String.valueOf(delimiter), -1);
                        loopCells[value] = "0";
                        lines.set(i, String.join(String.valueOf(delimiter), loopCells));
                    }
                }
                default -> throw new IllegalArgumentException(mutation);
            }
            return utf8(String.join("\n", lines) + "\n");
        }

        private static int header(List<String> lines) {
            for (int i = 0; i < lines.size(); i++) {
                if (!lines.get(i).isBlank() && !lines.get(i).startsWith("#")) {
                    return i;
                }
            }
            throw new IllegalStateException("no header");
        }

        private static int metadata(List<String> lines, String key) {
            for (int i = 0; i < lines.size(); i++) {
                if (lines.get(i).startsWith("# " + key + ":")) {
                    return i;
                }
            }
            throw new IllegalStateException("no " + key);
        }

        /** The column of B, J, M or χ in a header. */
        private static int valueColumn(String header, char delimiter) {
            String[] cells = header.split(String.valueOf(delimiter), -1);
            for (int i = 0; i < cells.length; i++) {
                char letter = cells[i].strip().charAt(0);
                if (letter == 'B' || letter == 'J' || letter == 'M' || letter == 'c' || letter == 'χ') {
                    return i;
                }
            }
            throw new IllegalStateException("no value column in " + header);
        }

        /** Every unit in the header replaced by one of the wrong kind for its letter. */
        private static String wrongUnit(String header, char delimiter) {
            String[] cells = header.split(String.valueOf(delimiter), -1);
            String letter = cells[0].strip().substring(0, 1);
            String unit = switch (letter) {
                case "H", "M" -> "T";
                case "T" -> "kA/m";
                default -> "kA/m";
            };
            cells[0] = cells[0].replaceFirst("\\[[^]]*]", "[" + unit + "]");
            return String.join(String.valueOf(delimiter), cells);
        }

        private static String times100(String number, char delimiter) {
            boolean comma = delimiter != ',' && number.contains(",");
            double value = Double.parseDouble(number.replace(',', '.')) * 100;
            String text = String.valueOf(Math.abs(value) < 1e-9 ? 100.0 : value);
            return comma ? text.replace('.', ',') : text;
        }

        private static void reverseValues(List<String> lines, int header, char delimiter, int value) {
            List<Integer> rows = new ArrayList<>();
            List<String> values = new ArrayList<>();
            for (int i = header + 1; i < lines.size(); i++) {
                if (!lines.get(i).isBlank() && !lines.get(i).startsWith("#")) {
                    rows.add(i);
                    values.add(lines.get(i).split(String.valueOf(delimiter), -1)[value]);
                }
            }
            for (int k = 0; k < rows.size(); k++) {
                String[] cells = lines.get(rows.get(k)).split(String.valueOf(delimiter), -1);
                cells[value] = values.get(values.size() - 1 - k);
                lines.set(rows.get(k), String.join(String.valueOf(delimiter), cells));
            }
        }
    }

    /** Mutations of the JSON form. */
    private static final class JsonMutations {

        static final List<String> NAMES = List.of("trailing-content", "truncated", "huge-number", "control-in-name", "bracket-removed",
                "bracket-doubled", "quote-doubled", "wrong-unit", "field-twice", "not-utf8", "br-times-100", "number-as-text");

        static byte[] apply(String mutation, String json, SplittableRandom random) {
            String text = switch (mutation) {
                case "trailing-content" -> json + TRAILING[random.nextInt(TRAILING.length)];
                case "truncated" -> json.substring(0, random.nextInt(json.lastIndexOf('}')));
                case "huge-number" -> replaceNumber(json, random, HUGE[random.nextInt(HUGE.length)]);
                case "control-in-name" -> json.replaceFirst("\"grade\": \"", "\"grade\": \""
                        + (random.nextBoolean() ? "\\\\u0000" : CONTROL[random.nextInt(CONTROL.length)]));
                case "bracket-removed" -> removeOne(json, random, ']');
                case "bracket-doubled" -> doubleOne(json, random, random.nextBoolean() ? '[' : '{');
                case "quote-doubled" -> doubleOne(json, random, '"');
                case "wrong-unit" -> json.replaceFirst("\"H \\[[^]]*]\"", "\"H [T]\"");
                case "field-twice" -> json.replaceFirst("\\{", "{\"family\": \"twice\", ");
                case "not-utf8" -> null;
                case "br-times-100" -> json.replaceFirst("\"rows\": \\[\\[([^,]+), ([^]]+)]", "\"rows\": [[$1, 1$2e2]");
                case "number-as-text" -> replaceNumber(json, random, "\"1.2\"");
                default -> throw new IllegalArgumentException(mutation);
            };
            if (text == null) {
                byte[] bytes = utf8(json);
                byte[] bad = new byte[bytes.length + 1];
                int at = random.nextInt(bytes.length);
                System.arraycopy(bytes, 0, bad, 0, at);
                bad[at] = (byte) 0xFF;
                System.arraycopy(bytes, at, bad, at + 1, bytes.length - at);
                return bad;
            }
            return utf8(text);
        }

        /** One number of the rows replaced. */
        private static String replaceNumber(String json, SplittableRandom random, String replacement) {
            int rows = json.indexOf("\"rows\"");
            List<int[]> numbers = new ArrayList<>();
            java.util.regex.Matcher matcher = java.util.regex.Pattern.compile("-?[0-9][0-9.eE+-]*").matcher(json);
            while (matcher.find()) {
                if (matcher.start() > rows) {
                    numbers.add(new int[] {matcher.start(), matcher.end()});
                }
            }
            int[] chosen = numbers.get(random.nextInt(numbers.size()));
            return json.substring(0, chosen[0]) + replacement + json.substring(chosen[1]);
        }

        private static String removeOne(String json, SplittableRandom random, char c) {
            return edit(json, random, c, (text, at) -> text.substring(0, at) + text.substring(at + 1));
        }

        private static String doubleOne(String json, SplittableRandom random, char c) {
            return edit(json, random, c, (text, at) -> text.substring(0, at) + c + text.substring(at));
        }

        private static String edit(String json, SplittableRandom random, char c, BiFunction<String, Integer, String> change) {
            List<Integer> places = new ArrayList<>();
            for (int i = 0; i < json.length(); i++) {
                if (json.charAt(i) == c) {
                    places.add(i);
                }
            }
            return change.apply(json, places.get(random.nextInt(places.size())));
        }
    }
}
