package org.meridian.ui;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import org.meridian.core.Study;
import org.meridian.sim.ListeningDemo;
import org.meridian.sim.Simulator;

/**
 * The bundled demo study (two-tone listening, {@link ListeningDemo}): the folder
 * {@code samples/two-tone-listening} when it is found from the working directory, otherwise the
 * same study simulated in memory (well under a second), so the window opens from anywhere.
 */
public final class DemoStudy {
    /** The folder of the bundled study, relative to a checkout. */
    public static final Path FOLDER = Path.of("samples", ListeningDemo.FOLDER);

    private DemoStudy() {
    }

    /** The bundled folder, when the working directory is a checkout (or one of its folders). */
    public static Optional<Path> folder() {
        Path dir = Path.of("").toAbsolutePath();
        for (int up = 0; dir != null && up < 3; up++, dir = dir.getParent()) {
            Path candidate = dir.resolve(FOLDER);
            if (Files.isRegularFile(candidate.resolve("study.tsv"))) {
                return Optional.of(candidate);
            }
        }
        return Optional.empty();
    }

    /** The demo study simulated in memory, identical in design to the bundled one. */
    public static Study simulated() {
        return Simulator.simulate(ListeningDemo.scenario(), ListeningDemo.SEED).study();
    }
}
