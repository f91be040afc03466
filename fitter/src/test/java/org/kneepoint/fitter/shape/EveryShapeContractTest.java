package org.kneepoint.fitter.shape;

import java.util.List;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.function.Executable;

class EveryShapeContractTest {

    @Nested
    class Cylinder extends MagnetShapeContract {
        @Override
        MagnetShape shape(double scale) {
            return new CylinderShape(0.01 * scale, 0.007 * scale);
        }

        @Override
        List<Executable> badSizes() {
            return List.of(() -> new CylinderShape(-0.01, 0.01), () -> new CylinderShape(0.01, Double.NaN),
                    () -> new CylinderShape(0.01, 0.0), () -> new CylinderShape(0.01, 20.0), () -> new CylinderShape(10, 1e-3));
        }
    }

    @Nested
    class Ring extends MagnetShapeContract {
        @Override
        MagnetShape shape(double scale) {
            return new RingShape(0.02 * scale, 0.008 * scale, 0.005 * scale);
        }

        @Override
        List<Executable> badSizes() {
            return List.of(() -> new RingShape(0.02, 0.03, 0.01), () -> new RingShape(0.02, 0.02, 0.01),
                    () -> new RingShape(0.02, -0.01, 0.01), () -> new RingShape(0.02, 0.01, Double.POSITIVE_INFINITY),
                    () -> new RingShape(0.02, 0.0001, 0.5));
        }
    }

    @Nested
    class Block extends MagnetShapeContract {
        @Override
        MagnetShape shape(double scale) {
            return new BlockShape(0.02 * scale, 0.01 * scale, 0.004 * scale);
        }

        @Override
        List<Executable> badSizes() {
            return List.of(() -> new BlockShape(0, 0.01, 0.01), () -> new BlockShape(0.01, -1, 0.01),
                    () -> new BlockShape(0.01, 0.01, 2.0), () -> new BlockShape(0.01, 5.0, 0.1));
        }
    }

    @Nested
    class Spheroid extends MagnetShapeContract {
        @Override
        MagnetShape shape(double scale) {
            return new SpheroidShape(0.01 * scale, 0.025 * scale);
        }

        @Override
        List<Executable> badSizes() {
            return List.of(() -> new SpheroidShape(0.01, -0.01), () -> new SpheroidShape(Double.NaN, 0.01),
                    () -> new SpheroidShape(1.0, 1e-4));
        }
    }

    @Nested
    class OnSteelPlate extends MagnetShapeContract {
        @Override
        MagnetShape shape(double scale) {
            return new MagnetOnSteelPlate(new BlockShape(0.02 * scale, 0.02 * scale, 0.005 * scale));
        }

        @Override
        List<Executable> badSizes() {
            return List.of(() -> new MagnetOnSteelPlate(null), () -> new MagnetOnSteelPlate(new CylinderShape(0.01, 6.0)));
        }
    }

    @Nested
    class Circuit extends MagnetShapeContract {
        @Override
        MagnetShape shape(double scale) {
            return new MagneticCircuit(0.005 * scale, 4e-4 * scale * scale, 0.001 * scale, 5e-4 * scale * scale, 1.3, 1.1);
        }

        @Override
        List<Executable> badSizes() {
            return List.of(() -> new MagneticCircuit(0, 1e-4, 1e-3, 1e-4, 1.2, 1.1), () -> new MagneticCircuit(0.01, -1e-4, 1e-3, 1e-4, 1.2, 1.1),
                    () -> new MagneticCircuit(0.01, 1e-4, 1e-3, 1e-4, 0.9, 1.1), () -> new MagneticCircuit(0.01, 1e-4, 1e-3, 1e-4, 1.2, 0.5));
        }
    }
}
