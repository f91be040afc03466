package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.curve.Quantity;
import org.kneepoint.fitter.library.LibraryCurve;
import org.kneepoint.fitter.loadline.AppliedField;
import org.kneepoint.server.app.design.CheckDocument;
import org.kneepoint.server.app.design.CheckRequest;
import org.kneepoint.server.app.design.CheckRun;
import org.kneepoint.server.app.design.DesignChecks;
import org.kneepoint.server.app.design.GradeChoice;
import org.kneepoint.server.app.design.GradeModel;
import org.kneepoint.server.app.design.LoadLineSpec;
import org.kneepoint.server.app.design.TypedGrade;
import org.kneepoint.server.app.wording.Cautions;
import org.kneepoint.server.text.CheckView;

/**
 * A stored grade whose hottest curve was measured only to 0.97·HcJ: a check whose operating point lies below that
 * field says so in its JSON ({@code beyondMeasuredField}), its cautions and its table (issue 11, item 5).
 */
class CheckBeyondMeasuredFieldTest {

    private static final double[] CELSIUS = {20, 80, 150};
    private static final GradeChoice.InputNames NAMES = new GradeChoice.InputNames("GRADE", "", "--br", "--br", "--alpha");

    /** Invented grade: a recoil line times a logistic knee, 0.5 mT noise; the 150 °C curve stops at 0.97·HcJ. */
    private static List<LibraryCurve> curves() {
        List<LibraryCurve> curves = new ArrayList<>();
        for (int c = 0; c < CELSIUS.length; c++) {
            double celsius = CELSIUS[c];
            double br = 1.30 * (1 - 0.0012 * (celsius - 20));
            double hcj = 1.9e6 * Math.exp(-0.006 * (celsius - 20));
            double lowest = c == CELSIUS.length - 1 ? 0.97 : 1.05;
            SplittableRandom random = new SplittableRandom(40 + c);
            double[] h = new double[200];
            double[] j = new double[200];
            for (int i = 0; i < h.length; i++) {
                h[i] = 2e4 - (2e4 + lowest * hcj) * i / (h.length - 1);
                j[i] = (br + MU0 * 0.05 * h[i]) * Math.tanh((h[i] + hcj) / (0.04 * hcj)) + 5e-4 * random.nextGaussian();
            }
            curves.add(new LibraryCurve("INVENTED", DemagnetizationCurve.of(Quantity.J, h, j, celsius + 273.15), "invented", "0"));
        }
        return curves;
    }

    private static CheckRun check(double opposingField) {
        GradeModel model = GradeModel.of("INVENTED", null, curves());
        CheckRequest request = new CheckRequest(new GradeChoice("INVENTED", new TypedGrade(null, null, null, null, null, null, null), NAMES),
                new LoadLineSpec(1.0, null, null, null, null, null, null, false, null), 150 + 273.15,
                AppliedField.opposing(opposingField), 0.01);
        return DesignChecks.check(request, name -> model);
    }

    @Test
    void a_point_below_the_measured_field_is_flagged_in_json_cautions_and_table() {
        CheckRun run = check(1.4e6);
        CheckDocument document = run.document();
        assertTrue(document.beyondMeasuredField(), "H = " + document.operatingPoint().h());
        assertTrue(document.cautions().contains(Cautions.BEYOND_MEASURED_FIELD), document.cautions().toString());
        assertTrue(CheckView.table(run).contains("beyond measured H    yes: the operating point lies below"), CheckView.table(run));
    }

    @Test
    void a_point_inside_the_measured_field_is_not_flagged() {
        CheckRun run = check(0);
        CheckDocument document = run.document();
        assertFalse(document.beyondMeasuredField(), "H = " + document.operatingPoint().h());
        assertFalse(document.cautions().contains(Cautions.BEYOND_MEASURED_FIELD), document.cautions().toString());
        assertFalse(CheckView.table(run).contains("beyond measured H"));
    }
}
