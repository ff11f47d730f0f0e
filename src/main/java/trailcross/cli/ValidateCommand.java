package trailcross.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import java.util.stream.Stream;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import trailcross.ephemeris.Ephemerides;
import trailcross.forecast.ValidationCase;
import trailcross.forecast.ValidationRunner;

/** {@code trailcross validate}: every validation case, computed against published. */
@Command(name = "validate", mixinStandardHelpOptions = true,
        description = {"Runs the validation cases (validation/cases/*.toml: a real body, what to compute, the published "
                + "values, tolerances and source) and prints computed against published; exit 1 if any fails.",
            "--quick runs only the cases marked quick (the test suite's); --case NAME one case by file name."})
final class ValidateCommand implements Callable<Integer> {

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Option(names = "--dir", defaultValue = "validation/cases", paramLabel = "DIR", description = "the cases' folder")
    Path dir;

    @Option(names = "--quick", description = "only the quick cases")
    boolean quick;

    @Option(names = "--case", paramLabel = "NAME", description = "only this case (file name without .toml)")
    String only;

    @Mixin
    EphemerisOption ephemeris;

    @Override
    public Integer call() throws IOException {
        if (!Files.isDirectory(dir)) {
            throw new IllegalArgumentException("--dir: " + dir + " is not a folder");
        }
        List<Path> files;
        try (Stream<Path> s = Files.list(dir)) {
            files = new ArrayList<>(s.filter(p -> p.toString().endsWith(".toml")).sorted().toList());
        }
        if (only != null) {
            files.removeIf(p -> !p.getFileName().toString().equals(only + ".toml"));
            if (files.isEmpty()) {
                throw new IllegalArgumentException("--case: no " + only + ".toml in " + dir);
            }
        }
        PrintWriter o = spec.commandLine().getOut();
        var eph = Ephemerides.fast(ephemeris.file);
        int failed = 0;
        int run = 0;
        for (Path f : files) {
            ValidationCase c = ValidationCase.read(f);
            if (quick && !c.quick()) {
                continue;
            }
            run++;
            o.printf(Locale.ROOT, "%s — %s%n  source: %s%n", f.getFileName(), c.name(), c.source());
            o.flush();
            for (ValidationRunner.Outcome r : ValidationRunner.run(c, eph, line -> {
                o.println("  " + line);
                o.flush();
            })) {
                o.printf(Locale.ROOT, "  %-20s computed %-34s published %-24s %-12s %s%n", r.quantity(), r.computed(),
                        r.published(), r.difference(), r.pass() ? "ok" : "FAIL");
                if (!r.pass()) {
                    failed++;
                }
            }
        }
        o.printf(Locale.ROOT, "%d case(s) run, %d check(s) failed%n", run, failed);
        return failed == 0 ? 0 : 1;
    }
}
