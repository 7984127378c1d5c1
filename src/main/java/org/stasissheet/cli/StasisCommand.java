package org.stasissheet.cli;

import java.io.PrintWriter;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/** The top command: holds the subcommands and maps every outcome to an exit code. */
@Command(name = "stasis",
        mixinStandardHelpOptions = true,
        versionProvider = StasisCommand.Version.class,
        description = "Sourced worksheet for hyperviscosity syndrome and leukostasis risk. "
                + "Decision support only: it supports, and never replaces, clinical judgement, local protocols "
                + "and licensed practice.",
        subcommands = {AssessCommand.class, PdfCommand.class, NoteCommand.class, TriageCommand.class,
                RulesCommand.class})
public final class StasisCommand implements Runnable {

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }

    /** Runs the command line and returns the exit code; never throws. */
    public static int run(String[] args) {
        return run(args, new PrintWriter(System.out, true), new PrintWriter(System.err, true));
    }

    public static int run(String[] args, PrintWriter rawOut, PrintWriter rawErr) {
        PrintWriter out = Terminal.safe(rawOut);
        PrintWriter err = Terminal.safe(rawErr);
        CommandLine cl = new CommandLine(new StasisCommand());
        cl.setOut(out);
        cl.setErr(err);
        cl.setExecutionExceptionHandler((ex, commandLine, parseResult) -> report(ex, err));
        cl.setParameterExceptionHandler((ex, args2) -> {
            err.println(Terminal.line("stasis: " + ex.getMessage()));
            err.println("Run 'stasis " + ex.getCommandLine().getCommandName() + " --help' for usage.");
            return ExitCode.INVALID_INPUT;
        });
        try {
            int code = cl.execute(args);
            out.flush();
            err.flush();
            return code;
        } catch (RuntimeException | Error e) {
            return report(e, err);
        }
    }

    static int report(Throwable ex, PrintWriter err) {
        if (ex instanceof InvalidInputException invalid) {
            Terminal.lines(invalid.lines()).forEach(err::println);
            err.flush();
            return ExitCode.INVALID_INPUT;
        }
        // An internal error: a short line, no stack trace, no patient data beyond the exception's own message.
        err.println(Terminal.line("stasis: internal error (" + ex.getClass().getSimpleName() + "): " + ex.getMessage()));
        err.println("No file was left half-written (every output is written whole or not at all). Please report this"
                + " with the command you ran.");
        err.flush();
        return ExitCode.INTERNAL_ERROR;
    }

    /** Reads the version from the jar manifest, or "development" when run from classes. */
    static final class Version implements CommandLine.IVersionProvider {
        @Override
        public String[] getVersion() {
            return new String[] {"Stasis Sheet " + ToolVersion.get()};
        }
    }
}
