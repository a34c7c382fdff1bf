package org.meridian.cli;

import java.io.PrintWriter;
import org.meridian.core.BadInputException;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/**
 * The command line: {@code java -jar meridian.jar COMMAND …}. Exit codes: 0 success, 2 bad input
 * or options, 1 an internal failure. Errors are one line {@code error: …} on stderr; a stack
 * trace only with {@code --debug}.
 */
@Command(name = "meridian",
        mixinStandardHelpOptions = true,
        versionProvider = Main.Version.class,
        description = "Grand averages, difference waves, scalp maps, span stability and "
                + "measures for averaged ERPs.",
        subcommands = {
            ViewCommand.class,
            InfoCommand.class,
            MeasureCommand.class,
            SpanCommand.class,
            MapsCommand.class,
            FigureCommand.class,
            CsdCommand.class,
            RepairCommand.class,
            SimulateCommand.class,
            MontageCommand.class,
        })
public final class Main implements Runnable {
    public static final int EXIT_OK = 0;
    public static final int EXIT_INTERNAL = 1;
    public static final int EXIT_BAD_INPUT = 2;

    @Option(names = "--debug", scope = CommandLine.ScopeType.INHERIT,
            description = "Print stack traces of errors.")
    boolean debug;

    @Override
    public void run() {
        try {
            new ViewCommand().call();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }

    public static void main(String[] args) {
        System.exit(run(args, new PrintWriter(System.out, true), new PrintWriter(System.err, true)));
    }

    /** Runs one command line, writing to the given streams; returns the exit code. */
    public static int run(String[] args, PrintWriter out, PrintWriter err) {
        return run(args, out, err, new Object[0]);
    }

    /** As {@link #run(String[], PrintWriter, PrintWriter)}, with further subcommands (for tests). */
    static int run(String[] args, PrintWriter out, PrintWriter err, Object... extraSubcommands) {
        Main main = new Main();
        CommandLine cl = new CommandLine(main);
        for (Object sub : extraSubcommands) {
            cl.addSubcommand(sub);
        }
        cl.setOut(out);
        cl.setErr(err);
        cl.setParameterExceptionHandler((ex, a) -> {
            err.println("error: " + oneLine(ex.getMessage()));
            return EXIT_BAD_INPUT;
        });
        cl.setExecutionExceptionHandler((ex, commandLine, parseResult) -> {
            boolean wantTrace = main.debug || parseResult.hasMatchedOption("--debug");
            if (ex instanceof BadInputException) {
                err.println("error: " + oneLine(ex.getMessage()));
                if (wantTrace) {
                    ex.printStackTrace(err);
                }
                return EXIT_BAD_INPUT;
            }
            if (wantTrace) {
                err.println("error: internal failure: " + oneLine(String.valueOf(ex)));
                ex.printStackTrace(err);
            } else {
                err.println("error: internal failure: " + oneLine(String.valueOf(ex))
                        + " (run again with --debug for details)");
            }
            return EXIT_INTERNAL;
        });
        int code;
        try {
            code = cl.execute(args);
        } catch (OutOfMemoryError e) {
            // picocli hands on Errors; the big arrays are unreachable by now, so printing works
            err.println("error: out of memory (" + Runtime.getRuntime().maxMemory() / (1 << 20)
                    + " MiB allowed): ask for less (e.g. a smaller --resolution) or give Java more"
                    + " memory (java -Xmx4g -jar meridian.jar …)");
            if (java.util.Arrays.asList(args).contains("--debug")) {
                e.printStackTrace(err);
            }
            code = EXIT_INTERNAL;
        }
        out.flush();
        err.flush();
        return code;
    }

    static String oneLine(String message) {
        if (message == null) {
            return "";
        }
        return message.replace("\r", " ").replace('\n', ' ').trim();
    }

    /** Reads the version from the jar's manifest. */
    static final class Version implements CommandLine.IVersionProvider {
        @Override
        public String[] getVersion() {
            String v = Main.class.getPackage().getImplementationVersion();
            return new String[] {"Meridian " + (v == null ? "(development build)" : v)};
        }
    }
}
