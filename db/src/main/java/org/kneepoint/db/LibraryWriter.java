package org.kneepoint.db;

import java.util.List;
import java.util.Map;
import java.util.concurrent.locks.Lock;
import org.jooq.DSLContext;
import org.jooq.exception.DataAccessException;
import org.jooq.impl.DSL;
import org.kneepoint.fitter.error.ConflictException;
import org.kneepoint.fitter.library.FitRecord;
import org.kneepoint.fitter.library.GradeDetails;
import org.kneepoint.fitter.library.GradeInfo;
import org.kneepoint.fitter.library.GradeSpecification;
import org.kneepoint.fitter.library.ImportBatch;
import org.kneepoint.fitter.library.ImportInfo;
import org.kneepoint.fitter.library.LibraryCurve;
import org.kneepoint.fitter.library.LibrarySnapshot;
import org.kneepoint.fitter.library.LotCurve;
import org.kneepoint.fitter.library.LotInfo;
import org.kneepoint.fitter.library.SusceptibilityPoint;

/**
 * Writes to the library, each call one transaction: an import batch, a restore, a fit. Writers of
 * one {@link Library} take turns (a lock), so concurrent imports never interleave their rows.
 * Writers in other processes sharing one server are kept apart by the database itself: unique
 * names and checksums, and a transaction that loses a race for one (or is chosen as a deadlock or
 * serialization victim) is run again from the start, when it sees the winner's rows.
 */
public final class LibraryWriter {

    /** Runs of one transaction that lost a race to another process before the error is reported. */
    private static final int ATTEMPTS = 4;

    private final DSLContext dsl;
    private final Lock turn;
    private final ConnectionFailures failures;

    LibraryWriter(DSLContext dsl, Lock turn, ConnectionFailures failures) {
        this.dsl = dsl;
        this.turn = turn;
        this.failures = failures;
    }

    /** Stores one import: its record, new grades, curves and susceptibility points. Nothing is written on any error. */
    public void importBatch(ImportInfo info, List<GradeInfo> grades, List<LibraryCurve> curves, List<SusceptibilityPoint> points) {
        importBatches(List.of(new ImportBatch(info, grades, curves, points)));
    }

    /** Stores several imports in one transaction: all of them, or on any error none. */
    public void importBatches(List<ImportBatch> batches) {
        inTransaction(rows -> {
            for (ImportBatch batch : batches) {
                writeBatch(rows, batch);
            }
        });
    }

    private static void writeBatch(RowWriter rows, ImportBatch batch) {
        ImportInfo info = batch.info();
        if (rows.importId(info.sha256()) != null) {
            throw new ConflictException("the file " + info.fileName() + " was already imported (same SHA-256)");
        }
        long importId = rows.insertImport(info);
        Map<String, Long> gradeIds = new java.util.HashMap<>();
        for (GradeInfo grade : batch.grades()) {
            gradeIds.put(grade.name(), rows.ensureGrade(grade));
        }
        for (LibraryCurve curve : batch.curves()) {
            rows.insertCurve(requireGrade(gradeIds, curve.grade()), curve, importId);
        }
        for (SusceptibilityPoint point : batch.susceptibility()) {
            rows.insertSusceptibility(point, importId);
        }
    }

    /** Restores a backup into an empty library. */
    public void restore(LibrarySnapshot snapshot) {
        inTransaction(rows -> {
            if (!rows.libraryIsEmpty()) {
                throw new ConflictException("the library is not empty; restore needs an empty database");
            }
            for (ImportInfo info : snapshot.imports()) {
                rows.insertImport(info);
            }
            Map<String, Long> gradeIds = new java.util.HashMap<>();
            for (GradeInfo grade : snapshot.grades()) {
                gradeIds.put(grade.name(), rows.ensureGrade(grade));
            }
            for (LibraryCurve curve : snapshot.curves()) {
                rows.insertCurve(requireGrade(gradeIds, curve.grade()), curve, rows.importId(curve.importSha256()));
            }
            for (SusceptibilityPoint point : snapshot.susceptibility()) {
                rows.insertSusceptibility(point, rows.importId(point.importSha256()));
            }
            for (FitRecord fit : snapshot.fits()) {
                rows.insertFit(fit);
            }
            QualificationRows qualification = new QualificationRows(rows.context());
            for (GradeSpecification specification : snapshot.specifications()) {
                qualification.writeSpecification(requireGrade(gradeIds, specification.grade()), specification.specification(),
                        specification.version());
            }
            Map<String, Long> lotIds = new java.util.HashMap<>();
            for (LotInfo lot : snapshot.lots()) {
                lotIds.put(lot.grade() + "\n" + lot.name(), qualification.ensureLot(requireGrade(gradeIds, lot.grade()), lot));
            }
            for (LotCurve curve : snapshot.lotCurves()) {
                Long lotId = lotIds.get(curve.grade() + "\n" + curve.lot());
                if (lotId == null) {
                    throw new IllegalArgumentException("curve of lot '" + curve.lot() + "' comes without its lot");
                }
                qualification.insertLotCurve(lotId, curve, rows.importId(curve.importSha256()));
            }
            QualificationChecksums.seal(rows.context());
        });
    }

    /**
     * Replaces a grade's details, provided nobody changed the grade since {@code expectedVersion}
     * (optimistic locking); returns the new version. A stale version is a conflict, an unknown
     * grade not found; either way nothing is written.
     */
    public int editGrade(String name, int expectedVersion, GradeDetails details) {
        int[] version = new int[1];
        inTransaction(rows -> version[0] = rows.editGrade(name, expectedVersion, details));
        return version[0];
    }

    /** Stores a fit with the grade, curve or material it came from. */
    public void saveFit(FitRecord fit) {
        inTransaction(rows -> rows.insertFit(fit));
    }

    private static long requireGrade(Map<String, Long> gradeIds, String grade) {
        Long id = gradeIds.get(grade);
        if (id == null) {
            throw new IllegalArgumentException("curve of grade '" + grade + "' comes without its grade");
        }
        return id;
    }

    void inTransaction(java.util.function.Consumer<RowWriter> work) {
        turn.lock();
        try {
            for (int attempt = 1; ; attempt++) {
                try {
                    dsl.transaction(configuration -> {
                        DSLContext tx = DSL.using(configuration);
                        RowCounts.takeWriteLock(tx);
                        work.accept(new RowWriter(tx));
                        RowCounts.seal(tx);
                    });
                    return;
                } catch (DataAccessException e) {
                    if (attempt == ATTEMPTS || !ConcurrentWrites.lostRace(e)) {
                        throw ConcurrentWrites.lostRace(e)
                                ? new ConflictException("another writer kept changing the same rows; nothing was written, try again")
                                : e;
                    }
                }
            }
        } catch (RuntimeException e) {
            throw failures.translate(e);
        } finally {
            turn.unlock();
        }
    }
}
