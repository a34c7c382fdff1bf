package org.meridian.cli;

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
        OptionErrors.about("--m", () -> SplineParameters.defaults().withOrder(order));
        OptionErrors.about("--lambda", () -> SplineParameters.defaults().withLambda(lambda));
        OptionErrors.about("--terms", () -> SplineParameters.defaults().withTerms(terms));
        OptionErrors.about("--radius-m", () -> SplineParameters.defaults().withHeadRadiusM(radiusM));
        return new SplineParameters(order, lambda, terms, radiusM);
    }

}
