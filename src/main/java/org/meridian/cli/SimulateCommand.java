package org.meridian.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import org.meridian.core.BadInputException;
import org.meridian.io.StudyWriter;
import org.meridian.sim.ListeningDemo;
import org.meridian.sim.Scenario;
import org.meridian.sim.Simulation;
import org.meridian.sim.Simulator;
import org.meridian.sim.TruthJson;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code simulate [--participants N] [--seed S] -o DIR}: the demo study (two-tone listening,
 * dipoles in a sphere) as a study folder with its ground truth in {@code truth.json}. With the
 * defaults it writes exactly the bundled {@code samples/two-tone-listening}.
 */
@Command(name = "simulate", mixinStandardHelpOptions = true,
        description = "Simulate the demo study (a two-tone listening scenario: current dipoles in "
                + "a homogeneous sphere plus 1/f background) and write it as a study folder with "
                + "its ground truth (truth.json). The defaults reproduce the bundled demo study.")
final class SimulateCommand implements Callable<Integer> {
    static final String TRUTH_FILE = "truth.json";

    @Spec
    CommandSpec spec;

    @Option(names = "--participants", paramLabel = "N",
            description = "Number of participants (default: ${DEFAULT-VALUE}).")
    int participants = ListeningDemo.PARTICIPANTS;

    @Option(names = "--seed", paramLabel = "S",
            description = "Random seed; the same seed gives the same study on every machine "
                    + "(default: ${DEFAULT-VALUE}).")
    long seed = ListeningDemo.SEED;

    @Option(names = "--noise-scale", paramLabel = "F",
            description = "Multiply the background noise by F; 0 gives noise-free averages "
                    + "(default: ${DEFAULT-VALUE}).")
    double noiseScale = 1;

    @Option(names = "--decimals", paramLabel = "D",
            description = "Digits after the decimal point of the µV values (default: ${DEFAULT-VALUE}).")
    int decimals = 3;

    @Option(names = "--gzip", negatable = true, defaultValue = "true", fallbackValue = "true",
            description = "Write the waveform files gzip-compressed (default: on; --no-gzip for plain text).")
    boolean gzip = true;

    @Option(names = "--force", description = "Replace DIR if it exists and is not empty.")
    boolean force;

    @Option(names = {"-o", "--output"}, required = true, paramLabel = "DIR",
            description = "The study folder to write.")
    Path output;

    @Override
    public Integer call() {
        if (participants < 1 || participants > 999) {
            throw new BadInputException("option --participants: must lie between 1 and 999, got "
                    + participants);
        }
        if (!(noiseScale >= 0) || !Double.isFinite(noiseScale)) {
            throw new BadInputException("option --noise-scale: must be zero or positive, got "
                    + noiseScale);
        }
        if (decimals < 0 || decimals > 9) {
            throw new BadInputException("option --decimals: must lie between 0 and 9, got " + decimals);
        }
        Scenario scenario = ListeningDemo.scenario(participants);
        scenario = scenario.withNoise(scenario.noise().scaled(noiseScale));
        Simulation sim = Simulator.simulate(scenario, seed);
        // the truth goes into the folder before it is renamed into place: never a study without it
        StudyWriter.write(sim.study(), output, new StudyWriter.Options(gzip, decimals, force),
                Map.of(TRUTH_FILE, TruthJson.of(sim.truth())));
        PrintWriter out = spec.commandLine().getOut();
        out.println("study: " + output);
        out.println("participants: " + sim.study().participants().size());
        out.println("conditions: " + String.join(", ", sim.study().conditions()));
        out.println("channels: " + sim.study().channelLabels().size());
        out.println("samples: " + sim.study().axis().samples());
        out.println("seed: " + seed);
        out.println(String.format(Locale.ROOT, "noise_scale: %s", noiseScale));
        out.println("truth: " + output.resolve(TRUTH_FILE));
        return Main.EXIT_OK;
    }
}
