package trailcross.stream;

import java.nio.file.Path;

/**
 * A stream file that cannot be used, with the place to mend it: the message reads
 * {@code file:line: key: what is wrong}, one line, so that the command line can print it as it is.
 */
public final class StreamFileException extends IllegalArgumentException {

    private static final long serialVersionUID = 1L;

    private final transient Path file;
    private final int line;
    private final String key;

    /**
     * @param file the stream file
     * @param line the 1-based line (0 when there is no line, e.g. a missing file)
     * @param key the dotted key concerned, or empty
     * @param problem what is wrong
     */
    public StreamFileException(Path file, int line, String key, String problem) {
        super(format(file, line, key, problem));
        this.file = file;
        this.line = line;
        this.key = key;
    }

    private static String format(Path file, int line, String key, String problem) {
        StringBuilder b = new StringBuilder(String.valueOf(file));
        if (line > 0) {
            b.append(':').append(line);
        }
        b.append(": ");
        if (key != null && !key.isEmpty()) {
            b.append(key).append(": ");
        }
        return b.append(problem.replace('\n', ' ')).toString();
    }

    /** @return the stream file */
    public Path file() {
        return file;
    }

    /** @return the 1-based line, 0 when none applies */
    public int line() {
        return line;
    }

    /** @return the dotted key, or empty */
    public String key() {
        return key;
    }
}
