package trailcross.io;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;

/**
 * Writes a text file so that it is never seen half-written: the content goes to a temporary file beside
 * the target, which is then moved into place in one step; on failure the temporary file is removed and
 * the old target, if any, is left as it was.
 */
public final class AtomicFile {

    /** The content of a file. */
    @FunctionalInterface
    public interface Content {
        /**
         * @param out where to write
         * @throws IOException on a write error
         */
        void write(Writer out) throws IOException;
    }

    private AtomicFile() {
    }

    /**
     * @param file the target (replaced if it exists)
     * @param content what to write
     * @throws UncheckedIOException naming the file when it cannot be written
     */
    public static void write(Path file, Content content) {
        Path dir = file.toAbsolutePath().getParent();
        Path tmp = null;
        try {
            Files.createDirectories(dir);
            tmp = Files.createTempFile(dir, "." + file.getFileName().toString(), ".tmp");
            try (Writer w = Files.newBufferedWriter(tmp, StandardCharsets.UTF_8)) {
                content.write(w);
            }
            Files.move(tmp, file, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
            tmp = null;
        } catch (IOException e) {
            throw new UncheckedIOException(file + ": cannot write: " + e.getMessage(), e);
        } finally {
            if (tmp != null) {
                try {
                    Files.deleteIfExists(tmp);
                } catch (IOException ignored) {
                    // the original error matters more than a leftover temporary file
                }
            }
        }
    }
}
