package org.kneepoint.db;

import java.nio.ByteBuffer;
import java.nio.ByteOrder;

/** A column of doubles as bytes: big-endian IEEE-754, 8 bytes each, exact both ways. */
final class PackedDoubles {

    private PackedDoubles() {
    }

    static byte[] pack(double[] values) {
        ByteBuffer buffer = ByteBuffer.allocate(values.length * Double.BYTES).order(ByteOrder.BIG_ENDIAN);
        buffer.asDoubleBuffer().put(values);
        return buffer.array();
    }

    static double[] unpack(byte[] bytes, int expectedCount) {
        if (bytes.length != expectedCount * Double.BYTES) {
            throw new IllegalStateException("a stored curve holds " + bytes.length + " bytes for " + expectedCount + " points");
        }
        double[] values = new double[expectedCount];
        ByteBuffer.wrap(bytes).order(ByteOrder.BIG_ENDIAN).asDoubleBuffer().get(values);
        return values;
    }
}
