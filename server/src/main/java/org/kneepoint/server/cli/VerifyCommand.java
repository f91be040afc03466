package org.kneepoint.server.cli;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.concurrent.Callable;
import org.kneepoint.db.Library;
import org.kneepoint.db.VerifyReport;
import org.kneepoint.server.text.PlainText;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/**
 * {@code kneepoint verify [--json]}: every stored row checked against its checksum, every curve
 * for all its points, every reference stored. Exit 0 when the library is
 * sound, 2 when anything is damaged (each damaged thing listed, naming its grade and curve).
 */
@Command(name = "verify", mixinStandardHelpOptions = true,
        description = {"Check the whole library against the checksums stored with its values.",
            "Exit 0: sound; exit 2: damaged (what is damaged is listed)."})
final class VerifyCommand implements Callable<Integer> {

    @Spec
    private CommandSpec spec;

    @Mixin
    private LibraryOption libraryOption;

    @Mixin
    private OutputOptions output;

    @Override
    public Integer call() {
        VerifyReport report;
        String library;
        try (Library opened = libraryOption.open()) {
            report = opened.reader().verify();
            library = opened.location().describe();
        }
        Map<String, Object> document = new LinkedHashMap<>();
        document.put("library", library);
        document.put("sound", report.clean());
        document.put("checked", new LinkedHashMap<>(report.checked()));
        document.put("damaged", report.damaged());
        output.print(spec.commandLine().getOut(), () -> document, () -> table(library, report));
        return report.clean() ? 0 : ErrorReporting.BAD_INPUT;
    }

    private static String table(String library, VerifyReport report) {
        StringBuilder text = new StringBuilder();
        int rows = report.checked().values().stream().mapToInt(Integer::intValue).sum();
        if (report.clean()) {
            text.append("The library at ").append(library).append(" is sound: ").append(rows).append(" stored rows match their checksums.")
                    .append(System.lineSeparator());
            return text.toString();
        }
        text.append("The library at ").append(library).append(" is DAMAGED (").append(report.damaged().size())
                .append(" problems); no damaged value is ever given out:").append(System.lineSeparator());
        report.damaged().forEach(line -> text.append("  ").append(PlainText.printable(line)).append(System.lineSeparator()));
        text.append("Restore a backup made before the damage ('kneepoint restore' into an empty library), or import the named data again.")
                .append(System.lineSeparator());
        return text.toString();
    }
}
