package org.meridian.core;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.List;
import org.junit.jupiter.api.Test;

class WaveformsTest {
    private static final TimeAxis AXIS = new TimeAxis(0, 1000, 5);

    private static Waveforms twoChannels() {
        // channel-major: channel 0 = 0..4, channel 1 = 10..14
        return new Waveforms(List.of("A", "B"), AXIS, Unit.MICROVOLT,
                new float[] {0, 1, 2, 3, 4, 10, 11, 12, 13, 14});
    }

    @Test
    void aSpanOfOneChannelIsCopied() {
        Waveforms w = twoChannels();
        float[] dst = new float[3];
        w.channelInto(1, 2, dst);
        assertThat(dst).containsExactly(12, 13, 14);
        w.channelInto(0, 0, dst);
        assertThat(dst).containsExactly(0, 1, 2);
        // the same samples as value(channel, sample)
        for (int s = 0; s < 3; s++) {
            assertThat(dst[s]).isEqualTo(w.value(0, s));
        }
    }

    @Test
    void aSpanOutsideTheDataIsRefused() {
        Waveforms w = twoChannels();
        assertThatThrownBy(() -> w.channelInto(0, 3, new float[3])).isInstanceOf(IndexOutOfBoundsException.class);
        assertThatThrownBy(() -> w.channelInto(2, 0, new float[1])).isInstanceOf(IndexOutOfBoundsException.class);
        assertThatThrownBy(() -> w.channelInto(0, -1, new float[1])).isInstanceOf(IndexOutOfBoundsException.class);
    }
}
