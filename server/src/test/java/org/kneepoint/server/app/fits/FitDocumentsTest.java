package org.kneepoint.server.app.fits;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.kneepoint.fitter.error.NotFoundException;
import org.kneepoint.fitter.model.ja.HysteresisSimulator;
import org.kneepoint.fitter.model.ja.JilesAthertonParameters;
import org.kneepoint.fitter.model.ja.LoopMetrics;
import org.kneepoint.fitter.model.ja.MajorLoopAnalysis;
import org.kneepoint.fitter.model.ja.Trajectory;
import org.kneepoint.server.app.DemoLibraryFixture;
import org.kneepoint.server.app.Json;
import org.kneepoint.server.app.JsonKeys;

/**
 * The fit documents over the demo library: the keys each writes (the keys other programs read; they stay as they
 * are), the shape's own keys only, and the fits that run on what the library stores.
 */
class FitDocumentsTest {

    private static final String NDFEB = "DEMO NdFeB 42/100";
    private static final String SMCO = "DEMO SmCo 28/200";

    @TempDir
    static Path folder;

    private static DemoLibraryFixture demo;

    @BeforeAll
    static void load() {
        demo = DemoLibraryFixture.in(folder);
    }

    @AfterAll
    static void close() {
        demo.close();
    }

    @Test
    void a_knee_fit_writes_its_keys_with_the_parameters_of_its_shape_only() {
        KneeFitDocument fit = LibraryFits.knee(demo.reader(), NDFEB, 293.15).get(0);
        List<String> keys = JsonKeys.of(fit);
        List<String> shapeKeys = keys.stream().filter(KneeFitParameters.SHAPE_KEYS::contains).toList();
        assertFalse(shapeKeys.isEmpty());
        assertTrue(shapeKeys.stream().allMatch(key -> key.startsWith(fit.parameters().kneeShape())), shapeKeys.toString());
        List<String> expected = new java.util.ArrayList<>(List.of("temperatureK", "br", "muRec", "hcj", "kneeWidth", "kneeShape", "muLine"));
        expected.addAll(shapeKeys);
        expected.addAll(List.of("hk", "bhMax", "rmsJ", "scatterJ", "rmsOverScatter", "standardErrors", "correlation", "iterations",
                "evaluations", "points", "hRange", "hcjExtrapolated", "approximate"));
        assertEquals(expected, keys);
        List<String> errors = new java.util.ArrayList<>(List.of("br", "muLine", "hcj"));
        errors.addAll(shapeKeys);
        errors.addAll(List.of("muRec", "kneeWidth"));
        assertEquals(errors, JsonKeys.of(fit.standardErrors()));
    }

    @Test
    void a_knee_fit_recovers_the_demo_grades_remanence_and_coercivity() {
        KneeFitDocument fit = LibraryFits.knee(demo.reader(), NDFEB, 293.15).get(0);
        assertEquals(1.31, fit.parameters().br(), 0.02, "the demo grade's Br at 20 °C (invented data)");
        assertEquals(1.00e6, fit.parameters().hcj(), 0.05e6, "the demo grade's HcJ at 20 °C (invented data)");
        assertEquals(293.15, fit.temperatureK(), 1e-9);
        assertEquals(2, fit.hRange().size());
        assertTrue(fit.hRange().get(0) < fit.hRange().get(1));
        assertEquals(fit.correlation().size(), fit.correlation().get(0).size());
    }

    @Test
    void without_a_temperature_every_normal_or_intrinsic_curve_is_fitted() {
        List<KneeFitDocument> fits = LibraryFits.knee(demo.reader(), NDFEB, null);
        assertTrue(fits.size() >= 4, "a curve per demo temperature: " + fits.size());
        assertEquals(fits.size(), fits.stream().map(KneeFitDocument::temperatureK).count());
    }

    @Test
    void a_knee_fit_at_a_temperature_without_a_curve_is_not_found() {
        NotFoundException error = assertThrows(NotFoundException.class, () -> LibraryFits.knee(demo.reader(), NDFEB, 500.0));
        assertTrue(error.getMessage().contains("at that temperature"), error.getMessage());
        assertThrows(NotFoundException.class, () -> LibraryFits.knee(demo.reader(), "no such grade", null));
    }

    @Test
    void a_shape_parameter_without_a_key_is_a_bug_not_a_silent_omission() {
        IllegalStateException error = assertThrows(IllegalStateException.class,
                () -> KneeFitParameters.shapeValues(List.of("switchingWidth", "newShapeBend"), new double[] {1, 2}));
        assertTrue(error.getMessage().contains("newShapeBend"), error.getMessage());
        Double[] values = KneeFitParameters.shapeValues(List.of("rationalBend", "rationalCurvature"), new double[] {0.3, 0.7});
        assertEquals(List.of(0.3, 0.7), java.util.Arrays.asList(values[3], values[4]));
        assertNull(values[0]);
    }

    @Test
    void a_temperature_fit_writes_its_coefficients_its_knee_fits_and_its_ranges() {
        TemperatureFitDocument fit = LibraryFits.temperature(demo.reader(), SMCO);
        List<String> keys = JsonKeys.of(fit);
        assertEquals(List.of("referenceTemperatureK", "alphaPercentPerK", "betaPercentPerK", "alpha2PercentPerK2", "beta2PercentPerK2",
                "muRecSlopePerK", "relativeKneeWidthSlopePerK", "fits", "measuredRangeK", "modelRangeK"), keys);
        assertEquals(-0.035, fit.parameters().alphaPercentPerK(), 0.01, "the demo SmCo grade's α (invented data)");
        assertEquals(5, fit.parameters().fits().size(), "one knee fit per demo temperature");
        List<String> row = JsonKeys.of(fit.parameters().fits().get(0));
        assertEquals(List.of("br", "muRec", "hcj", "kneeWidth", "kneeShape", "muLine"), row.subList(0, 6));
        assertEquals(List.of("temperatureK", "hk", "rmsJ"), row.subList(row.size() - 3, row.size()));
        assertEquals(293.15, fit.measuredRangeK().get(0), 1e-9);
        assertEquals(273.15 + 350, fit.measuredRangeK().get(1), 1e-9);
        assertTrue(fit.modelRangeK().get(1) >= fit.measuredRangeK().get(1));
    }

    @Test
    void a_temperature_fit_stores_the_parameters_its_document_begins_with() {
        TemperatureFitDocument fit = LibraryFits.temperature(demo.reader(), SMCO);
        JsonNode stored = Json.read(Json.compact(fit.parameters()));
        JsonNode document = Json.tree(fit);
        stored.fieldNames().forEachRemaining(key -> assertEquals(stored.get(key), document.get(key), key));
    }

    @Test
    void a_curie_weiss_fit_of_a_stored_material_names_its_source_and_is_not_saved() {
        CurieWeissFitDocument fit = LibraryFits.curieWeiss(demo.reader(), "DEMO paramagnetic salt");
        assertEquals(List.of("curieConstant", "weissTemperatureK", "chi0", "behaviour", "curieWeissSignificant", "standardErrors",
                "correlation", "rmsResidual", "points", "temperatureMinK", "temperatureMaxK", "evaluations", "source", "material", "form",
                "saved"), JsonKeys.of(fit));
        assertEquals("DEMO paramagnetic salt", fit.material());
        assertEquals("molar", fit.form());
        assertFalse(fit.saved());
        assertTrue(fit.curieWeissSignificant(), "a paramagnetic salt follows the Curie–Weiss law (invented data)");
        assertEquals(3, fit.correlation().size());
        NotFoundException error = assertThrows(NotFoundException.class, () -> LibraryFits.curieWeiss(demo.reader(), "unobtainium"));
        assertTrue(error.getMessage().contains("'unobtainium'"));
    }

    @Test
    void a_simulated_loop_writes_its_points_only_when_asked_for() {
        JilesAthertonParameters soft = new JilesAthertonParameters(1.6e6, 1100, 400, 0.2, 1.6e-3);
        LoopMetrics metrics = MajorLoopAnalysis.adaptive(soft).measure(5000);
        JilesAthertonLoopDocument without = JilesAthertonLoopDocument.of(soft, metrics, null);
        assertEquals(List.of("hc", "mr", "br", "hcj", "hcb", "mMax", "bMax", "lossPerCycle", "hMax", "parameters"), JsonKeys.of(without));
        assertEquals(List.of("ms", "a", "k", "c", "alpha"), JsonKeys.of(without.parameters()));
        Trajectory loop = HysteresisSimulator.adaptive(soft).simulate(new double[] {5000, 0, -5000, 0, 5000});
        JilesAthertonLoopDocument with = JilesAthertonLoopDocument.of(soft, metrics, loop);
        assertEquals("points", JsonKeys.of(with).get(10));
        assertEquals(5, with.points().size());
        assertEquals(List.of(5000.0, loop.fluxDensity()[0]), with.points().get(0));
    }

    @Test
    void a_correlation_that_is_not_finite_is_written_as_null() {
        List<List<Double>> rows = Matrices.rows(new double[][] {{1, Double.NaN}, {Double.NaN, 1}});
        assertEquals("[[1.0,null],[null,1.0]]", Json.compact(rows));
    }

    @Test
    void a_saved_fit_is_listed_with_its_parameters_read_back_as_they_were_saved() {
        int before = StoredFits.list(demo.reader()).size();
        KneeFitDocument fit = LibraryFits.knee(demo.reader(), NDFEB, 293.15).get(0);
        demo.library().writer().saveFit(FitSaving.record(NDFEB, 293.15, "intrinsic", null, "knee", fit.parameters(), fit.rmsJ()));
        List<StoredFits.StoredFit> fits = StoredFits.list(demo.reader());
        assertEquals(before + 1, fits.size());
        StoredFits.StoredFit stored = fits.get(fits.size() - 1);
        assertEquals(List.of("grade", "curveTemperatureK", "curveKind", "material", "model", "parameters", "residual", "fittedAt",
                "programVersion"), JsonKeys.of(stored));
        assertEquals(Json.tree(fit.parameters()), stored.parameters());
        assertEquals("knee", stored.model());
        assertEquals(NDFEB, stored.grade());
    }
}
