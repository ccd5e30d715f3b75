package org.trendwright.series;

import java.io.IOException;
import java.io.Reader;
import java.util.Arrays;

/**
 * A reader that remembers where its lines start, so that a CSV parser reading ahead of the
 * records can still name the line of each record, without keeping the text. Offsets of line
 * starts not yet passed by {@link #lineAt} are queued; the parser reads at most its buffer ahead,
 * so the queue stays small. Not thread-safe: one upload's reader.
 */
final class LineTrackingReader extends Reader {

    private final Reader in;
    private long offset;
    private long[] starts = new long[64];
    private int head;
    private int tail;
    private int linesPassed = 1;

    LineTrackingReader(Reader in) {
        this.in = in;
    }

    @Override
    public int read(char[] buffer, int from, int length) throws IOException {
        int n = in.read(buffer, from, length);
        for (int i = 0; i < n; i++) {
            if (buffer[from + i] == '\n') {
                queue(offset + i + 1);
            }
        }
        offset += Math.max(n, 0);
        return n;
    }

    private void queue(long start) {
        if (tail == starts.length) {
            int live = tail - head;
            starts = live * 2 > starts.length ? Arrays.copyOfRange(starts, head, head + starts.length * 2)
                    : Arrays.copyOfRange(starts, head, head + starts.length);
            head = 0;
            tail = live;
        }
        starts[tail++] = start;
    }

    /** The 1-based line of character offset {@code at}; offsets must be asked in increasing order. */
    int lineAt(long at) {
        while (head < tail && starts[head] <= at) {
            head++;
            linesPassed++;
        }
        return linesPassed;
    }

    /** The line of the last character read so far. */
    int lastLine() {
        return linesPassed + tail - head;
    }

    @Override
    public void close() throws IOException {
        in.close();
    }
}
