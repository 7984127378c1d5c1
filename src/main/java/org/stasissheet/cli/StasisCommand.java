package org.stasissheet.cli;

import org.stasissheet.load.ToolVersion;
import org.stasissheet.load.InvalidInputException;
import java.io.PrintWriter;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/** The top command: holds the subcommands and maps every outcome to an exit code. */
@Command(name = StasisCommand.NAME,
        versionProvider = StasisCommand.Version.class,
        description = "Sourced worksheet for hyperviscosity syndrome and leukostasis risk. "
                + "Decision support only: it supports, and never replaces, clinical judgement, local protocols "
                + "and licensed practice.",
        subcommands = {AssessCommand.class, CourseCommand.class, PdfCommand.class, NoteCommand.class, TriageCommand.class,
                RulesCommand.class, RegisterCommand.class, LabsCommand.class, ExportCommand.class})
public final class StasisCommand implements Runnable {
    /** The one program name: the jar, the launcher and every usage line. */
    public static final String NAME = "stasis-sheet";

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }

    /** Runs the command line and returns the exit code; never throws. */
    public static int run(String[] args) {
        return run(args, Terminal.console(System.out), Terminal.console(System.err));
    }

    public static int run(String[] args, PrintWriter rawOut, PrintWriter rawErr) {
        PrintWriter out = Terminal.safe(rawOut);
        PrintWriter err = Terminal.safe(rawErr);
        java.util.Optional<QuickPath.Run> quick = QuickPath.recognise(args);
        if (quick.isPresent()) {
            return QuickPath.run(quick.get(), out, err);
        }
        CommandLine cl = new CommandLine(new StasisCommand());
        ownWords(cl);
        cl.setOut(out);
        cl.setErr(err);
        cl.setExecutionExceptionHandler((ex, commandLine, parseResult) -> report(ex, err));
        cl.setParameterExceptionHandler((ex, args2) -> {
            err.println(Terminal.line(NAME + ": " + ex.getMessage()));
            err.println("For what '" + ex.getCommandLine().getCommandSpec().qualifiedName() + "' takes, run it with"
                    + " --help.");
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
        err.println(Terminal.line(NAME + ": internal error (" + ex.getClass().getSimpleName() + "): "
                + ex.getMessage()));
        err.println("No file was left half-written (every output is written whole or not at all). Please report this"
                + " with the command you ran.");
        err.flush();
        return ExitCode.INTERNAL_ERROR;
    }

    /**
     * Our own help and version options and headings on every command of the tree (added here, once, rather than the
     * library's stock ones): {@code -h/--help} everywhere, {@code --version} on the program itself.
     */
    static void ownWords(CommandLine cl) {
        CommandLine.Model.CommandSpec spec = cl.getCommandSpec();
        spec.addOption(CommandLine.Model.OptionSpec.builder("-h", "--help").usageHelp(true)
                .description("show what this command does and what it takes").build());
        if (cl.getParent() == null) {
            spec.addOption(CommandLine.Model.OptionSpec.builder("--version").versionHelp(true)
                    .description("print the program's version and the shipped rule set (name, version, SHA-256)")
                    .build());
        }
        spec.usageMessage().synopsisHeading("Run as: ").parameterListHeading("Takes:%n")
                .optionListHeading("Options:%n").commandListHeading("Commands:%n");
        cl.getSubcommands().values().forEach(StasisCommand::ownWords);
    }

    /** The program's version (from the jar manifest, or "development") and the shipped rule set it carries. */
    static final class Version implements CommandLine.IVersionProvider {
        @Override
        public String[] getVersion() {
            org.stasissheet.rules.LoadResult shipped = org.stasissheet.files.RuleSources.shipped();
            String rules = shipped instanceof org.stasissheet.rules.LoadResult.Loaded loaded
                    ? "shipped rule set " + loaded.ruleSet().provenance().name() + " "
                    + loaded.ruleSet().provenance().version() + ", SHA-256 " + loaded.ruleSet().provenance().sha256()
                    : "the shipped rule set could not be read";
            return new String[] {NAME + " " + ToolVersion.get(), rules};
        }
    }
}
