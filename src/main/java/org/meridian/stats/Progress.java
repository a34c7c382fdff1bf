package org.meridian.stats;

/**
 * Where long computations report how far they are and learn whether the user has asked them to
 * stop. The window passes one from its background worker; the command line passes
 * {@link #NONE}. Computations call {@link #update} and check {@link #cancelled} between blocks
 * of work (never inside the innermost loop), and stop with a
 * {@link java.util.concurrent.CancellationException} when asked to.
 */
public interface Progress {
    /** Reports nothing and never cancels. */
    Progress NONE = (done, total) -> { };

    /** {@code done} of {@code total} units of work are finished. */
    void update(long done, long total);

    /** Whether the user asked to stop; checked between blocks of work. */
    default boolean cancelled() {
        return false;
    }

    /** Throws a {@link java.util.concurrent.CancellationException} if the user asked to stop. */
    default void checkCancelled() {
        if (cancelled()) {
            throw new java.util.concurrent.CancellationException("cancelled");
        }
    }
}
