package org.meridian.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meridian.core.Study;
import org.meridian.io.StudyLoader;

/** The processing options of measure, maps and span: applied, stated, and checked by option. */
class ProcessingOptionsTest {
    private static final String DEMO = Path.of("samples", "two-tone-listening").toString();

    @Test
    void measuringAtTheReferenceChannelGivesZeroAndTheTableSaysWhatWasDone() {
        CliRun r = CliRun.of("measure", DEMO, "--window", "250:450", "--measure", "mean,peak",
                "--channels", "Cz,Pz", "--conditions", "rare", "--grand",
                "--reference", "Cz", "--low-pass", "30", "--baseline", "pre");
        assertThat(r.exitCode()).as(r.err()).isZero();
        List<String> lines = r.out().lines().toList();
        // DESIGN §4: '#' comment lines are allowed before the header
        assertThat(lines.get(0)).isEqualTo("# processing: reference Cz; low-pass 30 Hz, Butterworth order 4, "
                + "zero-phase; baseline before 0 ms");
        assertThat(lines.get(1)).startsWith("participant\t");
        List<String> cz = lines.stream().filter(l -> l.contains("\tCz\t")).toList();
        assertThat(cz).hasSize(2 * 17);
        for (String row : cz) {
            // v_Cz − v_Cz = 0 at every sample after re-referencing to Cz (textbook identity)
            assertThat(Double.parseDouble(row.split("\t")[5])).isCloseTo(0, within(1e-6));
        }
        assertThat(lines.stream().filter(l -> l.startsWith("grand\trare\tPz\tmean\t")).findFirst()
                .map(l -> Double.parseDouble(l.split("\t")[5]))).hasValueSatisfying(v -> assertThat(v).isPositive());
    }

    @Test
    void theAverageReferenceLeavesTheChannelSumAtZero() {
        Study demo = StudyLoader.load(Path.of(DEMO));
        CliRun r = CliRun.of("measure", DEMO, "--window", "300:400", "--measure", "mean",
                "--conditions", "frequent", "--reference", "average");
        assertThat(r.exitCode()).as(r.err()).isZero();
        double sum = 0;
        int rows = 0;
        for (String row : r.out().lines().filter(l -> l.startsWith("p03\t")).toList()) {
            String[] cells = row.split("\t");
            if (demo.montage().contains(cells[2])) {
                sum += Double.parseDouble(cells[5]);
                rows++;
            }
        }
        assertThat(rows).isEqualTo(demo.montage().size());
        // the window mean is linear, so Σ_c mean(v_c − v̄) = mean(Σ_c v_c − C·v̄) = 0 (textbook identity)
        assertThat(sum / rows).isCloseTo(0, within(1e-5));
        assertThat(r.out()).startsWith("# processing: average reference\n");
    }

    @Test
    void withoutProcessingTheTableHasNoComment() {
        CliRun r = CliRun.of("measure", DEMO, "--window", "300:400", "--measure", "mean", "--channels", "Pz");
        assertThat(r.out()).startsWith("participant\t");
    }

    @Test
    void mapsAndSpanStateTheProcessing(@TempDir Path dir) {
        CliRun maps = CliRun.of("maps", DEMO, "--condition", "rare", "--times", "380",
                "--reference", "average", "--high-pass", "0.5", "--filter-order", "2", "--baseline", "-200:0",
                "-o", dir.resolve("m.svg").toString());
        assertThat(maps.exitCode()).as(maps.err()).isZero();
        assertThat(maps.out()).contains("processing: average reference; high-pass 0.5 Hz, Butterworth order 2, "
                + "zero-phase; baseline -200:0 ms\n");
        CliRun span = CliRun.of("span", DEMO, "--condition", "rare", "--window", "300:400", "--permutations", "100",
                "--low-pass", "20", "-o", dir.resolve("s.tsv").toString());
        assertThat(span.exitCode()).as(span.err()).isZero();
        assertThat(span.err()).contains("processing: low-pass 20 Hz, Butterworth order 4, zero-phase");
    }

    @Test
    void mistakesNameTheOption() {
        assertThat(CliRun.of("measure", DEMO, "--window", "300:400", "--measure", "mean", "--reference", "M1").err())
                .startsWith("error: option --reference: channel M1 is not in the data;");
        assertThat(CliRun.of("measure", DEMO, "--window", "300:400", "--measure", "mean", "--low-pass", "300").err())
                .startsWith("error: option --low-pass: low-pass cut-off 300 Hz must lie below the Nyquist");
        assertThat(CliRun.of("measure", DEMO, "--window", "300:400", "--measure", "mean",
                "--low-pass", "5", "--high-pass", "10").err()).startsWith("error: option --high-pass: band-pass");
        assertThat(CliRun.of("measure", DEMO, "--window", "300:400", "--measure", "mean",
                "--low-pass", "5", "--filter-order", "0").err()).startsWith("error: option --filter-order:");
        assertThat(CliRun.of("measure", DEMO, "--window", "300:400", "--measure", "mean",
                "--restore-reference", "cz").err()).startsWith("error: option --restore-reference: cz is already");
        CliRun span = CliRun.of("span", DEMO, "--condition", "rare", "--window", "300:400", "--baseline", "-900:0");
        assertThat(span.err()).startsWith("error: option --baseline: window -900:0 ms lies outside the data");
        assertThat(span.exitCode()).isEqualTo(2);
    }
}
