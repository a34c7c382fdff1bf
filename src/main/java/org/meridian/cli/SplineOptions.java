package org.meridian.cli;

import org.meridian.core.BadInputException;
import org.meridian.spline.SplineParameters;
import picocli.CommandLine.Option;

/** The spherical-spline settings shared by {@code csd}, {@code repair} and {@code maps}. */
final class SplineOptions {
    @Option(names = "--m", paramLabel = "M", defaultValue = "4",
            description = "Spline order m (2-10; default ${DEFAULT-VALUE}).")
    int order;

    @Option(names = "--lambda", paramLabel = "L", defaultValue = "1e-5",
            description = "Smoothing lambda added to the kernel matrix's diagonal (0 interpolates exactly; "
                    + "default ${DEFAULT-VALUE}).")
    double lambda;

    @Option(names = "--terms", paramLabel = "T", defaultValue = "50",
            description = "Legendre terms of the kernels (default ${DEFAULT-VALUE}).")
    int terms;

    @Option(names = "--radius-m", paramLabel = "R", defaultValue = "0.1",
            description = "Head radius in metres, scaling the CSD (default ${DEFAULT-VALUE}).")
    double radiusM;

    /** The parameters; a bad value is an error naming its option. */
    SplineParameters parameters() {
        checked("--m", () -> SplineParameters.defaults().withOrder(order));
        checked("--lambda", () -> SplineParameters.defaults().withLambda(lambda));
        checked("--terms", () -> SplineParameters.defaults().withTerms(terms));
        checked("--radius-m", () -> SplineParameters.defaults().withHeadRadiusM(radiusM));
        return new SplineParameters(order, lambda, terms, radiusM);
    }

    private static SplineParameters checked(String option, java.util.function.Supplier<SplineParameters> make) {
        try {
            return make.get();
        } catch (BadInputException e) {
            throw new BadInputException("option " + option + ": " + e.getMessage(), e);
        }
    }
}
