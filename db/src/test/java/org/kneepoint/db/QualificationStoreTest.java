package org.kneepoint.db;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.time.LocalDate;
import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.kneepoint.db.TestLibraries.Engine;
import org.kneepoint.fitter.error.ConflictException;
import org.kneepoint.fitter.error.NotFoundException;
import org.kneepoint.fitter.library.GradeInfo;
import org.kneepoint.fitter.library.GradeSpecification;
import org.kneepoint.fitter.library.LibraryCurve;
import org.kneepoint.fitter.library.LibrarySnapshot;
import org.kneepoint.fitter.library.LotBatch;
import org.kneepoint.fitter.library.LotCurve;
import org.kneepoint.fitter.library.LotInfo;
import org.kneepoint.fitter.qualification.Limit;
import org.kneepoint.fitter.qualification.Specification;
import org.kneepoint.fitter.qualification.SpecifiedQuantity;

/** Specifications and lots on both engines. */
class QualificationStoreTest {

    private static final GradeInfo GRADE = new GradeInfo("Invented N40", "sintered NdFeB", null, null, null, "test");
    private static final LotInfo LOT = new LotInfo(GRADE.name(), "L-001", LocalDate.parse("2026-11-30"), "invented");

    private static Library withGrade(Engine engine) {
        Library library = TestLibraries.fresh(engine);
        library.writer().importBatch(TestLibraries.importInfo("grade.csv", 1, 1, 50), List.of(GRADE),
                List.of(new LibraryCurve(GRADE.name(), TestLibraries.curve(293.15, 50), "invented", null)), List.of());
        return library;
    }

    private static LotBatch batch(int seed, String sample, int points) {
        return new LotBatch(TestLibraries.importInfo("lot-" + seed + ".csv", seed, 1, points), LOT,
                List.of(new LotCurve(GRADE.name(), LOT.name(), sample, TestLibraries.curve(293.15, points), "invented lot", null)));
    }

    @ParameterizedTest
    @EnumSource(Engine.class)
    void a_specification_set_twice_merges_its_limits_and_counts_its_versions(Engine engine) {
        try (Library library = withGrade(engine)) {
            QualificationWriter writer = library.qualificationWriter();
            writer.setSpecification(GRADE.name(), new Specification(293.15, List.of(new Limit(SpecifiedQuantity.BR, 1.25, 1.29))));
            GradeSpecification second = writer.setSpecification(GRADE.name(),
                    new Specification(293.15, List.of(new Limit(SpecifiedQuantity.HCJ, 9.5e5, null), new Limit(SpecifiedQuantity.BR, 1.26, null))));
            assertEquals(2, second.version());
            List<GradeSpecification> stored = library.qualificationReader().specifications(GRADE.name());
            assertEquals(List.of(second), stored);
            assertEquals(new Limit(SpecifiedQuantity.BR, 1.26, 1.29), stored.get(0).specification().limit(SpecifiedQuantity.BR).orElseThrow());
        }
    }

    @ParameterizedTest
    @EnumSource(Engine.class)
    void a_lot_keeps_its_samples_apart_from_the_reference_curves_and_survives_a_snapshot(Engine engine) {
        try (Library library = withGrade(engine); Library copy = TestLibraries.fresh(engine)) {
            library.qualificationWriter().importLot(List.of(batch(2, "s1", 40), batch(3, "s2", 5000)));
            library.qualificationWriter().setSpecification(GRADE.name(), new Specification(293.15, List.of(new Limit(SpecifiedQuantity.BR, 1.2, null))));
            List<LotCurve> curves = library.qualificationReader().lotCurves(GRADE.name(), LOT.name());
            assertEquals(List.of("s1", "s2"), curves.stream().map(LotCurve::sample).toList());
            assertEquals(TestLibraries.curve(293.15, 5000), curves.get(1).curve());
            assertEquals(1, library.reader().curves(GRADE.name()).size());
            assertEquals(List.of(LOT), library.qualificationReader().lots(GRADE.name()));
            LibrarySnapshot snapshot = library.reader().snapshot();
            copy.writer().restore(snapshot);
            assertEquals(snapshot, copy.reader().snapshot());
            assertEquals(library.reader().rowCounts(), copy.reader().rowCounts());
        }
    }

    @ParameterizedTest
    @EnumSource(Engine.class)
    void a_refused_lot_import_writes_nothing(Engine engine) {
        try (Library library = withGrade(engine)) {
            library.qualificationWriter().importLot(List.of(batch(2, "s1", 40)));
            var before = library.reader().rowCounts();
            assertThrows(ConflictException.class, () -> library.qualificationWriter().importLot(List.of(batch(4, "s2", 40), batch(5, "s1", 40))));
            LotBatch otherGrade = new LotBatch(TestLibraries.importInfo("x.csv", 6, 1, 40), new LotInfo("Unknown", "L-9", null, null),
                    List.of(new LotCurve("Unknown", "L-9", "s1", TestLibraries.curve(293.15, 40), "invented", null)));
            assertThrows(NotFoundException.class, () -> library.qualificationWriter().importLot(List.of(otherGrade)));
            assertThrows(NotFoundException.class, () -> library.qualificationWriter().setSpecification("Unknown",
                    new Specification(293.15, List.of(new Limit(SpecifiedQuantity.BR, 1.2, null)))));
            assertEquals(before, library.reader().rowCounts());
        }
    }
}
