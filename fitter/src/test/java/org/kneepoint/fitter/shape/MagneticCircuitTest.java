package org.kneepoint.fitter.shape;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class MagneticCircuitTest {

    @Test
    void permeance_coefficient_follows_the_circuit_formula() {
        // Pc = (Lm·Ag)/(Am·Lg)·(σ/f), common practice (Parker 1990; Campbell 1994; docs/references.md §6c, from memory)
        MagneticCircuit circuit = new MagneticCircuit(0.006, 4e-4, 0.0015, 5e-4, 1.4, 1.2);
        double expected = 0.006 * 5e-4 / (4e-4 * 0.0015) * 1.4 / 1.2;
        assertEquals(expected, circuit.permeanceCoefficient(), 1e-12);
        assertEquals(expected, circuit.demagnetizingFactors().permeanceCoefficients().magnetometric(), 1e-12);
    }
}
