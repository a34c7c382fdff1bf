package org.meridian.span;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The full validation of the span test (issue 6): every case of {@link SpanValidation} at the
 * demo's noise level and at twice and three times it, 200 simulated studies each (seeds 1000…),
 * α = 0.05. Not part of the normal test run (its name does not end in Test); run it with
 * {@code mvn -Pspan-validation test}. Options: {@code -Dspan.validation.studies=N} (200),
 * {@code -Dspan.validation.seed=S} (the first seed, 1000), {@code -Dspan.validation.noise=1,2,3}
 * (the noise levels) and {@code -Dspan.validation.case=TEXT} (only the situations whose name
 * contains TEXT). Prints the table and writes it to {@code target/span-validation.md}. The
 * whole table takes about 17 minutes on two cores.
 */
class SpanValidationRun {
    @Test
    void writeTheValidationTable() throws IOException {
        int studies = Integer.getInteger("span.validation.studies", 200);
        long seed = Long.getLong("span.validation.seed", 1000);
        String only = System.getProperty("span.validation.case", "");
        List<SpanValidation.Tally> rows = new ArrayList<>();
        for (String level : System.getProperty("span.validation.noise", "1,2,3").split(",")) {
            double noise = Double.parseDouble(level.trim());
            for (SpanValidation.Case c : SpanValidation.cases(16, noise)) {
                if (!c.name().contains(only)) {
                    continue;
                }
                rows.add(SpanValidation.run(c, studies, seed, 0.05));
                System.out.println(c.name() + ", noise × " + noise + ": done");
            }
        }
        String table = SpanValidation.table(rows, 0.05);
        System.out.println(table);
        Files.writeString(Path.of("target", "span-validation.md"), table, StandardCharsets.UTF_8);
    }
}
