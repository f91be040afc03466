package org.kneepoint.server.text;

import java.util.List;
import java.util.Locale;
import org.kneepoint.server.app.lots.LotCheckDocument;
import org.kneepoint.server.app.lots.LotHistoryDocument;
import org.kneepoint.server.app.lots.LotImportDocument;
import org.kneepoint.server.app.lots.LotListDocument;
import org.kneepoint.server.app.lots.QuantityWording;
import org.kneepoint.server.app.lots.SpecificationDocument;
import org.kneepoint.server.app.wording.EngineeringUnits;
import org.kneepoint.server.app.wording.Temperatures;

/** Specifications, lot imports, lot lists and lot checks as readable text. */
public final class LotViews {

    private LotViews() {
    }

    public static String specifications(SpecificationDocument document) {
        StringBuilder out = new StringBuilder("Specifications of ").append(PlainText.printable(document.grade())).append('\n');
        if (document.specifications().isEmpty()) {
            return out.append("  none; set one with 'kneepoint spec set'\n").toString();
        }
        for (SpecificationDocument.Entry entry : document.specifications()) {
            out.append(String.format(Locale.ROOT, "  at %s (version %d)%n", Temperatures.celsius(entry.temperatureK()), entry.version()));
            for (SpecificationDocument.LimitEntry limit : entry.limits()) {
                out.append(String.format(Locale.ROOT, "    %-8s minimum %-14s typical %s%n", QuantityWording.name(limit.name()),
                        shown(limit.name(), limit.minimum()), shown(limit.name(), limit.typical())));
            }
        }
        return out.toString();
    }

    public static String imported(LotImportDocument document) {
        StringBuilder out = new StringBuilder();
        for (LotImportDocument.FileEntry file : document.files()) {
            out.append(String.format(Locale.ROOT, "%s: lot %s of %s, sample %s: %d curve(s), %d points at %s%n",
                    PlainText.printable(file.fileName()), PlainText.printable(document.lot()), PlainText.printable(document.grade()),
                    PlainText.printable(file.sample()), file.curves(), file.points(), Temperatures.list(file.temperaturesK())));
        }
        return out.toString();
    }

    public static String list(LotListDocument document) {
        StringBuilder out = new StringBuilder("Lots of ").append(PlainText.printable(document.grade())).append('\n');
        if (document.lots().isEmpty()) {
            return out.append("  none; import one with 'kneepoint lot import'\n").toString();
        }
        for (LotListDocument.Entry lot : document.lots()) {
            out.append(String.format(Locale.ROOT, "  %-16s measured %-10s samples %-20s at %s (%d curves)%s%n", PlainText.printable(lot.lot()),
                    lot.measuredOn() == null ? "-" : lot.measuredOn(), PlainText.printable(String.join(", ", lot.samples())),
                    Temperatures.list(lot.temperaturesK()), lot.curves(), lot.notes() == null ? "" : "  " + PlainText.printable(lot.notes())));
        }
        return out.toString();
    }

    public static String check(LotCheckDocument document) {
        StringBuilder out = new StringBuilder(String.format(Locale.ROOT, "Lot %s of %s: %s%n", PlainText.printable(document.lot()),
                PlainText.printable(document.grade()), document.verdict().toUpperCase(Locale.ROOT)));
        for (LotCheckDocument.Sample sample : document.samples()) {
            out.append(String.format(Locale.ROOT, "  sample %s at %s%n", PlainText.printable(sample.sample()),
                    Temperatures.celsius(sample.temperatureK())));
            for (LotCheckDocument.QuantityResult quantity : sample.quantities()) {
                out.append(String.format(Locale.ROOT, "    %-8s %-14s minimum %-14s margin %-14s %s%n", QuantityWording.name(quantity.name()),
                        shown(quantity.name(), quantity.value()), QuantityWording.format(quantity.name(), quantity.limit()),
                        shown(quantity.name(), quantity.margin()), quantity.verdict()));
            }
            out.append(sample.maxDeviation() == null ? "    J(H) not compared with a reference curve\n"
                    : String.format(Locale.ROOT, "    largest deviation of J(H) from the reference: %s of Br at H = %s%n",
                            EngineeringUnits.percent(sample.maxDeviation()), EngineeringUnits.field(sample.maxDeviationAtH())));
        }
        List<String> reasons = document.reasons();
        out.append("Reasons:\n");
        reasons.forEach(reason -> out.append("  - ").append(PlainText.printable(reason)).append('\n'));
        return out.toString();
    }

    public static String history(LotHistoryDocument document) {
        StringBuilder out = new StringBuilder(String.format(Locale.ROOT, "Lots of %s at %s%n", PlainText.printable(document.grade()),
                Temperatures.celsius(document.temperatureK())));
        if (document.lots().isEmpty()) {
            return out.append("  no lot measured at this temperature\n").toString();
        }
        out.append(String.format(Locale.ROOT, "  %-16s %-10s %-8s %-12s %-14s %-14s %s%n", "lot", "measured", "samples", "Br", "HcJ", "(BH)max", "Hk/HcJ"));
        for (LotHistoryDocument.LotValues lot : document.lots()) {
            out.append(String.format(Locale.ROOT, "  %-16s %-10s %-8d %-12s %-14s %-14s %s%n", PlainText.printable(lot.lot()),
                    lot.measuredOn() == null ? "-" : lot.measuredOn(), lot.samples(), shown("br", lot.br()), shown("hcj", lot.hcj()),
                    shown("bhMax", lot.bhMax()), shown("squareness", lot.squareness())));
        }
        for (LotHistoryDocument.QuantityStatistics quantity : document.quantities()) {
            out.append(String.format(Locale.ROOT, "  %-8s mean %-14s sd %-14s minimum %-14s Cpk %s%n", QuantityWording.name(quantity.name()),
                    shown(quantity.name(), quantity.mean()), shown(quantity.name(), quantity.standardDeviation()),
                    shown(quantity.name(), quantity.limit()),
                    quantity.cpk() == null ? (quantity.limit() != null && quantity.count() < 5 ? "- (from 5 lots on)" : "-") : EngineeringUnits.number(quantity.cpk())));
        }
        return out.toString();
    }

    private static String shown(String key, Double value) {
        return value == null ? "-" : QuantityWording.format(key, value);
    }
}
