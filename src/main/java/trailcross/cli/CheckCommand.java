package trailcross.cli;

import java.nio.file.Path;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;
import trailcross.report.StreamReport;
import trailcross.stream.StreamDefinition;
import trailcross.stream.StreamFileReader;

/** {@code trailcross check STREAM}: reads and validates a stream file and shows every value it will use. */
@Command(name = "check", mixinStandardHelpOptions = true,
        description = "Validates a stream file and prints every value it will use, defaults included.")
final class CheckCommand implements Callable<Integer> {

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Parameters(index = "0", paramLabel = "STREAM", description = "the stream file (TOML)")
    Path stream;

    @Override
    public Integer call() {
        StreamDefinition d = StreamFileReader.read(stream);
        StreamReport.print(d, spec.commandLine().getOut());
        return 0;
    }
}
