package org.meridian.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meridian.core.Study;
import org.meridian.core.TimeAxis;
import org.meridian.io.StudyLoader;
import org.meridian.io.StudyWriter;
import org.meridian.measure.MeasureRequest;
import org.meridian.measure.MeasureTable;
import org.meridian.measure.Measurement;
import org.meridian.signal.ConditionExpression;
import org.meridian.signal.TimeWindow;
import org.meridian.testing.StudyFixtures;

class MeasureCommandTest {
    private static final TimeAxis AXIS = new TimeAxis(-100, 250, 200);
    private static final List<String> LABELS = List.of("P3", "Pz", "P4", "PO7", "PO8");

    @TempDir
    Path tmp;
    private Path folder;

    /** Three participants; "rare" has a bump of 4 + p µV at 300 + 8p ms, larger on the right. */
    @BeforeEach
    void writeStudy() {
        Study.Builder b = Study.builder("cli test");
        for (int p = 0; p < 3; p++) {
            double amp = 4 + p;
            double latency = 300 + 8 * p;
            b.add(StudyFixtures.participant(p), "rare", StudyFixtures.waves(LABELS, AXIS, List.of(
                    t -> amp * bump(t, latency), t -> 2 * amp * bump(t, latency), t -> 1.5 * amp * bump(t, latency),
                    t -> amp * bump(t, latency), t -> 3 * amp * bump(t, latency))), 40 + p);
            b.add(StudyFixtures.participant(p), "common", StudyFixtures.waves(LABELS, AXIS, List.of(
                    t -> 1, t -> 1, t -> 1, t -> 1, t -> 1)), 120);
        }
        folder = tmp.resolve("study");
        StudyWriter.write(b.build(), folder, new StudyWriter.Options(false, 6, false));
    }

    private static double bump(double t, double centre) {
        return Math.exp(-Math.pow((t - centre) / 40, 2) / 2);
    }

    @Test
    void writesTheSameTableAsTheLibraryToStandardOutput() {
        CliRun r = CliRun.of("measure", folder.toString(), "--window", "200:500",
                "--measure", "peak,peak-latency", "--channels", "Pz,P3+Pz+P4",
                "--conditions", "rare, rare - common", "--grand");
        assertThat(r.err()).isEmpty();
        assertThat(r.exitCode()).isZero();
        Study loaded = StudyLoader.load(folder);
        MeasureTable expected = Measurement.run(loaded, MeasureRequest.builder()
                .condition(ConditionExpression.parse("rare", loaded))
                .condition(ConditionExpression.parse("rare - common", loaded))
                .channel("Pz").channel("P3+Pz+P4").window(TimeWindow.parse("200:500"))
                .measure("peak").measure("peak-latency").grand(true).build());
        assertThat(r.out()).isEqualTo(expected.toTsv());
        assertThat(r.out().lines()).contains(
                "p01\trare\tPz\tpeak-latency\t200:500\t300\tms",
                "p03\trare - common\tPz\tpeak\t200:500\t11\tµV");
        // 2 conditions × 2 channels × 2 measures × (3 participants + grand), plus the header
        assertThat(r.out().lines()).hasSize(1 + 2 * 2 * 2 * 4);
    }

    @Test
    void writesTheTableToAFileWhenAsked() throws IOException {
        Path out = tmp.resolve("measures.tsv");
        CliRun r = CliRun.of("measure", folder.toString(), "--window=200:500", "--measure", "mean",
                "--channels", "Pz", "-o", out.toString());
        assertThat(r.exitCode()).as(r.err()).isZero();
        assertThat(r.out()).isEmpty();
        assertThat(Files.readAllLines(out)).first()
                .isEqualTo("participant\tcondition\tchannel\tmeasure\twindow_ms\tvalue\tunit");
        // rare and common for three participants
        assertThat(Files.readAllLines(out)).hasSize(7);
    }

    @Test
    void jackknifeRowsAreAddedAndMarked() {
        CliRun r = CliRun.of("measure", folder.toString(), "--window", "200:500", "--measure",
                "frac-peak-latency", "--channels", "Pz", "--conditions", "rare", "--jackknife", "--grand");
        assertThat(r.exitCode()).as(r.err()).isZero();
        List<String> rows = r.out().lines().skip(1).toList();
        assertThat(rows).hasSize(3 + 3 + 1);
        assertThat(rows.subList(3, 6)).allMatch(l -> l.contains("\tfrac-peak-latency (jackknife)\t"));
        double mean = rows.subList(3, 6).stream().mapToDouble(l -> Double.parseDouble(l.split("\t")[5]))
                .average().orElseThrow();
        double grand = Double.parseDouble(rows.get(6).split("\t")[5]);
        // Smulders (2010): the retrieved scores average to about the grand average's score
        assertThat(mean).isCloseTo(grand, within(1.0));
    }

    @Test
    void aLateralisedWaveIsReportedUnderTheRightHemisphereLabel() {
        CliRun r = CliRun.of("measure", folder.toString(), "--window", "200:500", "--measure", "peak",
                "--lateralised", "rare,common", "--channels", "PO8");
        assertThat(r.exitCode()).as(r.err()).isZero();
        // PO8 = 3 × bump, PO7 = 1 × bump: ½[(3 − 1)·amp + (1 − 1)] = amp at the peak
        assertThat(r.out().lines().skip(1)).first().asString()
                .startsWith("p01\tcontra-ipsi(left: rare, right: common)\tPO8\tpeak\t200:500\t4\t");
    }

    @Test
    void anEmptyValueIsAnEmptyCellAndAWarning() {
        CliRun r = CliRun.of("measure", folder.toString(), "--window", "290:400", "--measure",
                "frac-peak-latency", "--channels", "Pz", "--conditions", "rare");
        assertThat(r.exitCode()).isZero();
        assertThat(r.out().lines()).contains("p01\trare\tPz\tfrac-peak-latency\t290:400\t\tms");
        assertThat(r.err()).startsWith("warning: p01, rare, Pz, frac-peak-latency 290:400 ms: "
                + "the wave does not cross 50 % of the peak");
    }

    @Test
    void mistakesAreOneLineNamingTheOption() {
        CliRun typo = CliRun.of("measure", folder.toString(), "--window", "200:500", "--measure",
                "mean", "--conditions", "rare - comon");
        assertThat(typo.exitCode()).isEqualTo(2);
        assertThat(typo.err()).isEqualTo("error: option --conditions: condition expression \"rare - comon\","
                + " character 8: no condition \"comon\"; did you mean \"common\"?" + System.lineSeparator());
        CliRun outside = CliRun.of("measure", folder.toString(), "--window", "600:900", "--measure", "mean");
        assertThat(outside.exitCode()).isEqualTo(2);
        assertThat(outside.err()).startsWith("error: option --window: window 600:900 ms lies outside the data (-100..696 ms)");
        CliRun measure = CliRun.of("measure", folder.toString(), "--window", "200:500", "--measure", "peek");
        assertThat(measure.err()).startsWith("error: option --measure: no measure \"peek\"; did you mean \"peak\"?");
        CliRun signed = CliRun.of("measure", folder.toString(), "--window", "200:500", "--measure", "peak",
                "--polarity", "signed");
        assertThat(signed.err()).startsWith("error: option --measure: measure peak needs polarity pos or neg");
        CliRun window = CliRun.of("measure", folder.toString(), "--window", "200-500", "--measure", "mean");
        assertThat(window.err()).startsWith("error: option --window: window \"200-500\" is not START:END");
        CliRun channel = CliRun.of("measure", folder.toString(), "--window", "200:500", "--measure", "mean",
                "--channels", "Pzz");
        assertThat(channel.err()).startsWith("error: option --channels: no channel Pzz; did you mean Pz?");
        CliRun fraction = CliRun.of("measure", folder.toString(), "--window", "200:500", "--measure", "mean",
                "--fraction", "1.5");
        assertThat(fraction.err()).startsWith("error: option --fraction: fraction must lie in (0, 1]");
        assertThat(List.of(measure, signed, window, channel, fraction)).allMatch(x -> x.exitCode() == 2);
    }

    @Test
    void optionsThatReferToTheStudyNameTheOptionWhenTheStudyLacksWhatTheyAskFor() {
        // DESIGN §9: every error names the option at fault
        CliRun exclude = CliRun.of("measure", folder.toString(), "--window", "200:500", "--measure",
                "mean", "--exclude", "p99");
        assertThat(exclude.err()).startsWith("error: option --exclude: cannot exclude participant p99: ");
        CliRun everyone = CliRun.of("measure", folder.toString(), "--window", "200:500", "--measure",
                "mean", "--exclude", "p01,p02,p03");
        assertThat(everyone.err()).startsWith("error: option --exclude: no participants left");
        CliRun baseline = CliRun.of("measure", folder.toString(), "--window", "200:500", "--measure",
                "mean", "--baseline", "-300:0");
        assertThat(baseline.err()).startsWith("error: option --baseline: window -300:0 ms lies outside the data (-100..696 ms)");
        CliRun badBaseline = CliRun.of("measure", folder.toString(), "--window", "200:500", "--measure",
                "mean", "--baseline", "early");
        assertThat(badBaseline.err()).startsWith("error: option --baseline: window \"early\" is not START:END");
        CliRun region = CliRun.of("measure", folder.toString(), "--window", "200:500", "--measure",
                "mean", "--channels", "P3+Pq");
        assertThat(region.err()).startsWith("error: option --channels: no channel Pq");
        // a lateralised wave has only the right-hemisphere labels of its pairs
        CliRun lateral = CliRun.of("measure", folder.toString(), "--window", "200:500", "--measure",
                "mean", "--lateralised", "rare,common", "--channels", "PO7");
        assertThat(lateral.err()).startsWith("error: option --channels: contra-ipsi(left: rare, right: common): no channel PO7");
        CliRun condition = CliRun.of("measure", folder.toString(), "--window", "200:500", "--measure",
                "mean", "--conditions", "rare, 'often'");
        assertThat(condition.err()).startsWith("error: option --conditions: ");
        assertThat(List.of(exclude, everyone, baseline, badBaseline, region, lateral, condition))
                .allMatch(x -> x.exitCode() == 2)
                .allMatch(x -> x.err().lines().count() == 1);
    }

    @Test
    void measuresTheBundledDemoStudy() {
        CliRun r = CliRun.of("measure", Path.of("samples", "two-tone-listening").toString(),
                "--window", "250:450", "--measure", "mean,peak-latency", "--channels", "Pz",
                "--conditions", "rare - frequent", "--grand", "--baseline", "pre");
        assertThat(r.exitCode()).as(r.err()).isZero();
        Study demo = StudyLoader.load(Path.of("samples", "two-tone-listening"));
        assertThat(r.out().lines().findFirst()).hasValue("# processing: baseline before 0 ms");
        assertThat(r.out().lines().skip(2)).hasSize(2 * (demo.participants().size() + 1));
        // the rare tones' P3 makes the difference wave positive at Pz in the grand average
        String grandMean = r.out().lines().filter(l -> l.startsWith("grand\t") && l.contains("\tmean\t"))
                .findFirst().orElseThrow();
        assertThat(Double.parseDouble(grandMean.split("\t")[5])).isPositive();
    }
}
