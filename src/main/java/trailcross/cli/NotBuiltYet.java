package trailcross.cli;

import java.util.concurrent.Callable;
import picocli.CommandLine;

/**
 * Base of the commands of the design that are listed but whose stage is not built yet: they say so in
 * one line and exit with {@link Main#NOT_BUILT}, never pretending to compute.
 */
abstract class NotBuiltYet implements Callable<Integer> {

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @CommandLine.Unmatched
    java.util.List<String> ignored;

    @Override
    public Integer call() {
        spec.commandLine().getErr().println("trailcross " + spec.name()
                + ": not available in this version yet (its stage is still being built)");
        return Main.NOT_BUILT;
    }
}
