package org.kneepoint.fitter.shape;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;
import org.kneepoint.fitter.error.BadInputException;

/**
 * The contract every shape keeps (STYLE: one abstract suite for every variant): 0 &lt; N &lt; 1 for each
 * kind, Pc = (1 − N)/N (docs/design.md §4), N unchanged when every size doubles (N is dimensionless and
 * magnetostatics has no length scale), volume growing eightfold, bad sizes rejected with a message
 * that names the size and what was expected.
 */
abstract class MagnetShapeContract {

    /** A typical instance with every size multiplied by scale. */
    abstract MagnetShape shape(double scale);

    /** Constructions with bad sizes, each of which must throw. */
    abstract List<Executable> badSizes();

    @Test
    void every_factor_lies_strictly_between_zero_and_one() {
        DemagnetizingFactors factors = shape(1).demagnetizingFactors();
        for (DemagnetizingKind kind : DemagnetizingKind.values()) {
            double n = factors.factor(kind);
            assertTrue(n > 0 && n < 1, kind + ": " + n);
        }
    }

    @Test
    void permeance_coefficient_is_one_minus_n_over_n() {
        DemagnetizingFactors factors = shape(1).demagnetizingFactors();
        PermeanceCoefficients pc = factors.permeanceCoefficients();
        for (DemagnetizingKind kind : DemagnetizingKind.values()) {
            double n = factors.factor(kind);
            assertEquals((1 - n) / n, pc.coefficient(kind), 1e-14 * pc.coefficient(kind));
        }
    }

    @Test
    void doubling_all_sizes_keeps_the_factors() {
        DemagnetizingFactors one = shape(1).demagnetizingFactors();
        DemagnetizingFactors two = shape(2).demagnetizingFactors();
        for (DemagnetizingKind kind : DemagnetizingKind.values()) {
            assertEquals(one.factor(kind), two.factor(kind), 1e-13, kind.toString());
        }
        assertEquals(8 * shape(1).volume(), shape(2).volume(), 1e-12 * shape(2).volume());
    }

    @Test
    void bad_sizes_are_rejected_with_a_clear_message() {
        List<Executable> cases = badSizes();
        assertFalse(cases.isEmpty());
        for (Executable construction : cases) {
            BadInputException error = assertThrows(BadInputException.class, construction);
            assertTrue(error.getMessage().matches(".* must .*, got .*"), error.getMessage());
        }
    }
}
