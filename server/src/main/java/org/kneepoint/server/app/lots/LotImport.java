package org.kneepoint.server.app.lots;

import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.kneepoint.db.Library;
import org.kneepoint.fitter.curve.CurveCharacterizer;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.ConflictException;
import org.kneepoint.fitter.error.InputLocation;
import org.kneepoint.fitter.library.ImportInfo;
import org.kneepoint.fitter.library.LotBatch;
import org.kneepoint.fitter.library.LotCurve;
import org.kneepoint.fitter.library.LotInfo;
import org.kneepoint.importer.csv.CurveFile;
import org.kneepoint.importer.csv.FileContent;
import org.kneepoint.importer.csv.ReadLimits;
import org.kneepoint.importer.files.CurveFiles;
import org.kneepoint.importer.input.InputFile;

/**
 * Imports a lot's curve files: each file read once and its reader chosen once
 * ({@link CurveFiles#read}, so the same formats and physical limits as {@code import}), each curve
 * required to have a temperature and to characterize, the file's checksum and name kept as its
 * import record. A file naming another grade, a file imported before and a susceptibility table
 * are refused. All files in one transaction: on any error nothing is written.
 */
public final class LotImport {

    private LotImport() {
    }

    public static LotImportDocument run(Library library, ReadLimits limits, LotImportRequest request) {
        Specifications.requireGrade(library, request.grade());
        LotInfo lot = valid(() -> new LotInfo(request.grade(), request.lot(), request.measuredOn(), request.notes()));
        Instant now = Instant.now();
        List<LotBatch> batches = new ArrayList<>();
        List<LotImportDocument.FileEntry> entries = new ArrayList<>();
        List<String> checksums = new ArrayList<>();
        for (Path path : request.files()) {
            InputFile input = InputFile.load(path, limits.maxBytes());
            String name = path.getFileName().toString();
            library.reader().importWithChecksum(input.sha256()).ifPresent(earlier -> {
                throw new ConflictException("the file " + name + " was already imported (as " + earlier.fileName() + " at "
                        + earlier.importedAt() + ", same SHA-256); nothing was written");
            });
            if (checksums.contains(input.sha256())) {
                throw new BadInputException(InputLocation.of(name), "the same content as another file of this import");
            }
            checksums.add(input.sha256());
            String sample = request.sample() != null ? request.sample() : sampleName(name);
            LotBatch batch = batch(input, lot, sample, now);
            batches.add(batch);
            entries.add(new LotImportDocument.FileEntry(batch.info().fileName(), input.sha256(), sample,
                    batch.curves().stream().map(curve -> curve.curve().temperatureK()).distinct().sorted().toList(),
                    batch.info().curves(), batch.info().points()));
        }
        library.qualificationWriter().importLot(batches);
        return new LotImportDocument(request.grade(), request.lot(), entries);
    }

    private static LotBatch batch(InputFile input, LotInfo lot, String sample, Instant now) {
        FileContent content = CurveFiles.read(input);
        InputLocation at = InputLocation.of(input.source());
        if (!(content instanceof CurveFile file)) {
            throw new BadInputException(at, "a susceptibility table, not a curve file; a lot holds demagnetization curves");
        }
        String named = file.metadata().grade();
        if (named != null && !named.equals(lot.grade())) {
            throw new BadInputException(at, "the file names grade '" + named + "', but the lot is of grade '" + lot.grade() + "'");
        }
        if (file.curves().stream().anyMatch(curve -> curve.temperatureK() == null)) {
            throw new BadInputException(at, "no temperature; add '# temperature: 20 °C' or a T column");
        }
        String source = file.metadata().source() == null ? file.source() : file.metadata().source();
        List<LotCurve> curves = new ArrayList<>();
        int points = 0;
        for (DemagnetizationCurve curve : file.curves()) {
            try {
                CurveCharacterizer.characterize(curve);
            } catch (BadInputException e) {
                throw new BadInputException(InputLocation.of(String.format(Locale.ROOT, "%s (curve at %.2f K)", file.source(),
                        curve.temperatureK())), e.getMessage());
            }
            curves.add(valid(() -> new LotCurve(lot.grade(), lot.name(), sample, curve, source, input.sha256())));
            points += curve.size();
        }
        return new LotBatch(new ImportInfo(file.source(), input.sha256(), now, curves.size(), points, 0), lot, curves);
    }

    /** A file's name without its extension ("s1-20C" for "s1-20C.csv"). */
    private static String sampleName(String fileName) {
        int dot = fileName.lastIndexOf('.');
        return dot > 0 ? fileName.substring(0, dot) : fileName;
    }

    private static <T> T valid(java.util.function.Supplier<T> value) {
        try {
            return value.get();
        } catch (IllegalArgumentException e) {
            throw new BadInputException(e.getMessage());
        }
    }
}
