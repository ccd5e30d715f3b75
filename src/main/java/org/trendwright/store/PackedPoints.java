package org.trendwright.store;

import java.nio.ByteBuffer;
import java.util.ArrayList;
import java.util.List;
import org.trendwright.series.Frequency;
import org.trendwright.series.Period;
import org.trendwright.series.Point;
import org.trendwright.series.SeriesDraft;

/**
 * The stored form of a version's points: one value of 16 bytes per point in period order, the
 * period index (a 64-bit integer) then the value (an IEEE 754 double), both big-endian. One value
 * per version instead of one row per observation lets an upload of a million observations be
 * written as a thousand rows, and keeps every double exact. Stateless and thread-safe.
 */
final class PackedPoints {

    static final int BYTES_PER_POINT = 16;

    private PackedPoints() {
    }

    static byte[] pack(SeriesDraft draft) {
        ByteBuffer out = ByteBuffer.allocate(draft.size() * BYTES_PER_POINT);
        for (int i = 0; i < draft.size(); i++) {
            out.putLong(draft.periodIndex(i)).putDouble(draft.value(i));
        }
        return out.array();
    }

    static byte[] pack(List<Point> points) {
        ByteBuffer out = ByteBuffer.allocate(points.size() * BYTES_PER_POINT);
        for (Point point : points) {
            out.putLong(point.period().index()).putDouble(point.value());
        }
        return out.array();
    }

    static List<Point> unpack(byte[] packed, Frequency frequency) {
        if (packed.length % BYTES_PER_POINT != 0) {
            throw new IllegalStateException("A stored version holds " + packed.length + " bytes of points, not a"
                    + " multiple of " + BYTES_PER_POINT + "; the store is damaged.");
        }
        ByteBuffer in = ByteBuffer.wrap(packed);
        List<Point> points = new ArrayList<>(packed.length / BYTES_PER_POINT);
        while (in.hasRemaining()) {
            points.add(new Point(new Period(frequency, in.getLong()), in.getDouble()));
        }
        return points;
    }
}
