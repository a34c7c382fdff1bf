package org.meridian.cli;

import java.util.function.Supplier;
import org.meridian.core.BadInputException;

/** Puts the option at fault in front of a library's error: {@code option --window: …}. */
final class OptionErrors {
    private OptionErrors() {
    }

    /** Runs one step of reading an option; a bad-input error from it names the option. */
    static <T> T about(String option, Supplier<T> step) {
        try {
            return step.get();
        } catch (BadInputException e) {
            throw new BadInputException("option " + option + ": " + e.getMessage(), e);
        }
    }
}
