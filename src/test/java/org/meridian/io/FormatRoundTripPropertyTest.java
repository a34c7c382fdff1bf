package org.meridian.io;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.Random;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import org.meridian.core.Study;
import org.meridian.core.Unit;
import org.meridian.core.Waveforms;
import org.meridian.io.VariantWriter.Delimiter;
import org.meridian.io.VariantWriter.Layout;
import org.meridian.io.VariantWriter.Orientation;
import org.meridian.io.VariantWriter.UnitText;
import org.meridian.io.VariantWriter.Variant;

/** Any study written in any format variant of DESIGN §4 reads back equal. */
class FormatRoundTripPropertyTest {

    @Property(tries = 200)
    void everyFormatVariantReadsBackEqual(@ForAll("variants") Variant v,
            @ForAll("seeds") long seed) throws Exception {
        Random r = new Random(seed);
        boolean csd = r.nextInt(8) == 0;
        Variant variant = csd ? new Variant(v.orientation(), v.delimiter(), v.crlf(), v.gzip(),
                UnitText.NONE, v.layout(), v.comments(), v.seed()) : v;
        boolean single = v.layout() == Layout.SINGLE_FILE;
        Study original = RandomStudies.study(r, single ? 1 : 3, single ? 1 : 3,
                csd ? Unit.MICROVOLT_PER_SQUARE_METRE : Unit.MICROVOLT);
        Path dir = TempDirs.create();
        try {
            Path arg = VariantWriter.write(original, dir, variant);
            Study loaded = StudyLoader.load(arg);
            if (single) {
                assertThat(loaded.participants()).containsExactly("single");
                assertThat(loaded.conditions()).containsExactly("single");
            } else if (v.layout() == Layout.LONG_TABLE) {
                // rows may be shuffled: names keep the order of first appearance
                assertThat(loaded.participants())
                        .containsExactlyInAnyOrderElementsOf(original.participants());
                assertThat(loaded.conditions())
                        .containsExactlyInAnyOrderElementsOf(original.conditions());
            } else {
                assertThat(loaded.participants()).isEqualTo(original.participants());
                assertThat(loaded.conditions()).isEqualTo(original.conditions());
            }
            boolean exact = variant.unit().fromMicrovolts == 1;
            for (int p = 0; p < original.participants().size(); p++) {
                for (int c = 0; c < original.conditions().size(); c++) {
                    Waveforms got = single ? loaded.waveforms(0, 0) : loaded.waveforms(
                            original.participants().get(p), original.conditions().get(c));
                    if (v.layout() == Layout.LONG_TABLE) {
                        assertThat(got.labels()).containsExactlyInAnyOrderElementsOf(
                                original.channelLabels());
                        got = got.reorderedLike(original.waveforms(p, c));
                    }
                    assertSameWaveforms(got, original.waveforms(p, c), exact);
                    if (v.layout() == Layout.MANIFEST_FILE || v.layout() == Layout.MANIFEST_FOLDER) {
                        assertThat(loaded.trials(p, c)).isEqualTo(original.trials(p, c));
                    }
                }
            }
        } finally {
            TempDirs.delete(dir);
        }
    }

    /**
     * Equal labels, axis and unit; values equal exactly when written in µV (a float's shortest
     * decimal text reads back as the same float) and within float precision after a unit
     * conversion.
     */
    static void assertSameWaveforms(Waveforms got, Waveforms want, boolean exact) {
        assertThat(got.labels()).isEqualTo(want.labels());
        assertThat(got.axis().describeDifference(want.axis())).isNull();
        assertThat(got.unit()).isEqualTo(want.unit());
        for (int ch = 0; ch < want.channelCount(); ch++) {
            for (int s = 0; s < want.sampleCount(); s++) {
                float a = got.value(ch, s);
                float b = want.value(ch, s);
                if (exact) {
                    assertThat(a).isEqualTo(b);
                } else {
                    assertThat((double) a).isCloseTo(b, org.assertj.core.data.Offset.offset(
                            2.0 * Math.ulp(b)));
                }
            }
        }
    }

    @Provide
    Arbitrary<Long> seeds() {
        return Arbitraries.longs();
    }

    @Provide
    Arbitrary<Variant> variants() {
        return Combinators.combine(
                Arbitraries.of(Orientation.class),
                Arbitraries.of(Delimiter.class),
                Arbitraries.of(true, false),
                Arbitraries.of(true, false),
                Arbitraries.of(UnitText.class),
                Arbitraries.of(Layout.class),
                Arbitraries.of(true, false),
                Arbitraries.longs())
                .as(Variant::new);
    }
}
