package org.headway.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * A large table's rows are formatted in chunks on every core and written in order: the text must be
 * the rows in order, whatever the count's position against the chunk and window sizes.
 */
class NetworkOutputChunksTest {

    @ParameterizedTest(name = "{0} rows")
    @ValueSource(ints = {0, 1, 8191, 8192, 8193, 4096 * 9 + 1, 4096 * 40, 100_003})
    void rowsComeOutInOrder(int count) throws IOException {
        StringBuilder expected = new StringBuilder();
        for (int i = 0; i < count; i++) {
            expected.append("row ").append(i).append(",").append(i * 0.5).append('\n');
        }
        StringBuilder out = new StringBuilder();
        NetworkOutput.inChunks(count, out, (from, to, sb) -> {
            for (int i = from; i < to; i++) {
                sb.append("row ").append(i).append(",").append(i * 0.5).append('\n');
            }
        });
        assertEquals(expected.toString(), out.toString());
    }
}
