package org.kneepoint.db;

import java.nio.ByteBuffer;
import java.nio.ByteOrder;

/**
 * A column of doubles as bytes: big-endian IEEE-754, 8 bytes each, exact both ways; long columns
 * are cut into pieces of at most {@link #PIECE} values, stored in rows of their own (see the
 * migration V3), and joined again on reading.
 */
final class PackedDoubles {

    /** Values in the curve row and in each further piece. */
    static final int PIECE = 4096;

    private PackedDoubles() {
    }

    /** The values from {@code from} (inclusive) to {@code to} (exclusive). */
    static byte[] pack(double[] values, int from, int to) {
        ByteBuffer buffer = ByteBuffer.allocate((to - from) * Double.BYTES).order(ByteOrder.BIG_ENDIAN);
        buffer.asDoubleBuffer().put(values, from, to - from);
        return buffer.array();
    }

    /**
     * Copies the packed values into {@code values} from {@code offset}; returns the offset after
     * them. Bytes that cannot be the curve's points are damage to {@code what}.
     */
    static int unpackInto(byte[] bytes, double[] values, int offset, String what) {
        int count = bytes.length / Double.BYTES;
        if (bytes.length % Double.BYTES != 0 || offset + count > values.length) {
            throw new DamagedDataException(DamagedDataException.message(what + " holds " + bytes.length + " bytes of points at point "
                    + offset + " of " + values.length));
        }
        ByteBuffer.wrap(bytes).order(ByteOrder.BIG_ENDIAN).asDoubleBuffer().get(values, offset, count);
        return offset + count;
    }
}
