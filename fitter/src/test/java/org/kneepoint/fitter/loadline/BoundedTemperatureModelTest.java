package org.kneepoint.fitter.loadline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.kneepoint.fitter.error.BadInputException;

class BoundedTemperatureModelTest {

    @Test
    void a_slowly_falling_law_stops_below_the_curie_temperature_of_its_family() {
        // β −0.2 %/K would keep HcJ positive to T0 + 500 K = 793 K, far past Nd2Fe14B's Curie point (≈ 585 K; Herbst 1991)
        LinearTemperatureLaw law = LinearTemperatureLaw.ofPercentPerKelvin(Grades.neodymium(), -0.1, -0.2, 293.15);
        BoundedTemperatureModel bounded = BoundedTemperatureModel.of(law, MagnetFamily.NDFEB);
        assertTrue(bounded.highestTemperature() < 585.0 && bounded.highestTemperature() > 584.9);
        BadInputException refused = assertThrows(BadInputException.class, () -> bounded.at(600.0));
        assertTrue(refused.getMessage().contains("Curie temperature of NdFeB"), refused.getMessage());
    }

    @Test
    void a_model_whose_advertised_range_overruns_its_coercivity_ends_before_hcj_reaches_zero() {
        // HcJ0·(1 + β·ΔT) = 0 at ΔT = 166.67 K for β = −0.6 %/K; the model below claims 100 K more than that
        LinearTemperatureLaw law = Grades.neodymiumLaw();
        TemperatureModel overrunning = new TemperatureModel() {
            @Override
            public IntrinsicCurve at(double temperature) {
                return law.at(temperature);
            }

            @Override
            public double referenceTemperature() {
                return 293.15;
            }

            @Override
            public double remanenceRatio(double temperature) {
                return law.remanenceRatio(temperature);
            }

            @Override
            public double lowestTemperature() {
                return 233.15;
            }

            @Override
            public double highestTemperature() {
                return 293.15 + 266.67;
            }
        };
        BoundedTemperatureModel bounded = BoundedTemperatureModel.of(overrunning, null);
        assertEquals(293.15 + 1 / 0.006, bounded.highestTemperature(), 2e-3);
        assertTrue(((LinearRecoilKnee) bounded.at(bounded.highestTemperature())).intrinsicCoercivity() > 0);
        assertEquals("where the model's HcJ, Br or knee depth reaches zero", bounded.topReason());
        assertEquals(233.15, bounded.lowestTemperature(), 0.0);
    }

    @Test
    void family_names_as_stored_name_their_family() {
        assertEquals(Optional.of(MagnetFamily.NDFEB), MagnetFamily.recognize("sintered NdFeB"));
        assertEquals(Optional.of(MagnetFamily.NDFEB), MagnetFamily.recognize("bonded Nd-Fe-B"));
        assertEquals(Optional.of(MagnetFamily.SM2CO17), MagnetFamily.recognize("sintered SmCo"));
        assertEquals(Optional.of(MagnetFamily.SMCO5), MagnetFamily.recognize("SmCo5"));
        assertEquals(Optional.of(MagnetFamily.HARD_FERRITE), MagnetFamily.recognize("hard ferrite"));
        assertEquals(Optional.of(MagnetFamily.ALNICO), MagnetFamily.recognize("cast AlNiCo"));
        assertEquals(Optional.empty(), MagnetFamily.recognize("soft magnetic iron"));
    }
}
