package org.kneepoint.server.app.imports;

import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.kneepoint.db.LibraryReader;
import org.kneepoint.fitter.curve.CurveCharacterizer;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;
import org.kneepoint.fitter.library.GradeInfo;
import org.kneepoint.fitter.library.ImportBatch;
import org.kneepoint.fitter.library.ImportInfo;
import org.kneepoint.fitter.library.LibraryCurve;
import org.kneepoint.fitter.library.SusceptibilityPoint;
import org.kneepoint.importer.csv.CurveFile;
import org.kneepoint.importer.csv.CurveMetadata;
import org.kneepoint.importer.csv.FileContent;
import org.kneepoint.importer.csv.ReadLimits;
import org.kneepoint.importer.csv.SusceptibilityTable;
import org.kneepoint.importer.files.CurveFiles;
import org.kneepoint.importer.input.InputFile;

/**
 * Reads and checks files for import and says what each would add. A curve file must name its
 * grade and family and give each curve a temperature, and every curve must characterize (so a
 * stored curve is always usable); a susceptibility table must name its material. Files already
 * imported (same SHA-256) are planned as "already imported", not parsed. Each file is read from
 * disk once ({@link InputFile}) and its reader chosen once ({@link CurveFiles#read}).
 */
public final class ImportPlanner {

    private final ReadLimits limits;
    private final LibraryReader library;

    public ImportPlanner(ReadLimits limits, LibraryReader library) {
        this.limits = limits;
        this.library = library;
    }

    /** Plans every file in order, reporting each step to {@code progress}. */
    public List<ImportPlan> plan(List<Path> files, Instant now, ImportProgress progress) {
        Tally tally = new Tally(progress, files.size());
        List<ImportPlan> plans = new ArrayList<>();
        List<String> checksums = new ArrayList<>();
        for (Path file : files) {
            String name = file.getFileName().toString();
            tally.at(ImportStep.Stage.READING, name);
            InputFile input = InputFile.load(file, limits.maxBytes());
            String sha = input.sha256();
            Optional<ImportInfo> earlier = library.importWithChecksum(sha);
            if (earlier.isPresent()) {
                plans.add(new ImportPlan(name, null, earlier.get()));
            } else if (checksums.contains(sha)) {
                throw new BadInputException(InputLocation.of(name), "the same content as another file of this import");
            } else {
                plans.add(new ImportPlan(name, batch(input, now, tally), null));
            }
            checksums.add(sha);
            tally.fileChecked();
        }
        return plans;
    }

    private static ImportBatch batch(InputFile input, Instant now, Tally tally) {
        FileContent content = CurveFiles.read(input);
        if (content instanceof SusceptibilityTable table) {
            tally.now(ImportStep.Stage.VALIDATING);
            return susceptibilityBatch(table, input.sha256(), now);
        }
        return curveBatch((CurveFile) content, input.sha256(), now, tally);
    }

    private static ImportBatch curveBatch(CurveFile file, String sha, Instant now, Tally tally) {
        tally.curvesFound(file.curves().size());
        tally.now(ImportStep.Stage.VALIDATING);
        CurveMetadata meta = file.metadata();
        InputLocation at = InputLocation.of(file.source());
        if (meta.grade() == null) {
            throw new BadInputException(at, "no grade; add a line '# grade: NAME' before the header");
        }
        if (meta.family() == null) {
            throw new BadInputException(at, "no family; add a line '# family: NAME' (e.g. sintered NdFeB) before the header");
        }
        if (file.curves().stream().anyMatch(curve -> curve.temperatureK() == null)) {
            throw new BadInputException(at, "no temperature; add '# temperature: 20 °C' or a T column");
        }
        String provenance = "imported from " + file.source() + " (SHA-256 " + sha + ") at " + now
                + (meta.source() == null ? "" : "; source: " + meta.source());
        GradeInfo grade = named(at, () -> new GradeInfo(meta.grade(), meta.family(), meta.supplier(), meta.density(), meta.notes(), provenance));
        List<LibraryCurve> curves = new ArrayList<>();
        int points = 0;
        for (DemagnetizationCurve curve : file.curves()) {
            tally.now(ImportStep.Stage.CHARACTERIZING);
            try {
                CurveCharacterizer.characterize(curve);
            } catch (BadInputException e) {
                throw new BadInputException(InputLocation.of(String.format(Locale.ROOT, "%s (curve at %.2f K)", file.source(),
                        curve.temperatureK())), e.getMessage());
            }
            tally.curveChecked();
            curves.add(new LibraryCurve(grade.name(), curve, meta.source() == null ? file.source() : meta.source(), sha));
            points += curve.size();
        }
        ImportInfo info = new ImportInfo(file.source(), sha, now, curves.size(), points, 0);
        return new ImportBatch(info, List.of(grade), curves, List.of());
    }

    private static ImportBatch susceptibilityBatch(SusceptibilityTable table, String sha, Instant now) {
        InputLocation at = InputLocation.of(table.source());
        List<SusceptibilityPoint> points = new ArrayList<>();
        for (double[] point : table.points()) {
            points.add(named(at, () -> new SusceptibilityPoint(table.material(), point[0], point[1], table.form(), table.density(),
                    table.molarMass(), table.sourceText() == null ? table.source() : table.sourceText(), sha)));
        }
        ImportInfo info = new ImportInfo(table.source(), sha, now, 0, 0, points.size());
        return new ImportBatch(info, List.of(), List.of(), points);
    }

    /** Builds a value, turning its validation message into bad input at the file. */
    private static <T> T named(InputLocation at, java.util.function.Supplier<T> value) {
        try {
            return value.get();
        } catch (IllegalArgumentException e) {
            throw new BadInputException(at, e.getMessage());
        }
    }

    /** The counts of one planning, reported as each step begins. */
    private static final class Tally {

        private final ImportProgress progress;
        private final int files;
        private ImportStep.Stage stage;
        private String file;
        private int filesChecked;
        private int curvesChecked;
        private int curvesFound;

        Tally(ImportProgress progress, int files) {
            this.progress = progress;
            this.files = files;
        }

        void at(ImportStep.Stage next, String name) {
            file = name;
            now(next);
        }

        void now(ImportStep.Stage next) {
            stage = next;
            report();
        }

        void curvesFound(int count) {
            curvesFound += count;
        }

        void curveChecked() {
            curvesChecked++;
        }

        void fileChecked() {
            filesChecked++;
            report();
        }

        private void report() {
            progress.report(new ImportStep(stage, file, filesChecked, files, curvesChecked, curvesFound));
        }
    }
}
