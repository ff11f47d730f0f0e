package trailcross.io;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

/** Checks, before any long work starts, that an output folder can be written (created if need be). */
public final class OutputFolder {

    private OutputFolder() {
    }

    /**
     * @param dir the folder
     * @param option the option that named it, for the message
     * @throws IllegalArgumentException in one line when it is a file or cannot be created or written
     */
    public static void check(Path dir, String option) {
        if (Files.exists(dir) && !Files.isDirectory(dir)) {
            throw new IllegalArgumentException(option + " " + dir + ": is a file, not a folder");
        }
        try {
            Files.createDirectories(dir);
            Path probe = Files.createTempFile(dir, ".write-test", ".tmp");
            Files.delete(probe);
        } catch (IOException | SecurityException e) {
            throw new IllegalArgumentException(option + " " + dir + ": cannot write there (" + e.getMessage() + ")");
        }
    }

    /**
     * @param file an output file
     * @param option the option that named it, for the message
     * @throws IllegalArgumentException in one line when it is a folder or its folder cannot be written
     */
    public static void checkFile(Path file, String option) {
        if (Files.isDirectory(file)) {
            throw new IllegalArgumentException(option + " " + file + ": is a folder, not a file");
        }
        Path parent = file.toAbsolutePath().getParent();
        if (Files.exists(parent) && !Files.isDirectory(parent)) {
            throw new IllegalArgumentException(option + " " + file + ": " + parent + " is a file, not a folder");
        }
        check(parent, option);
    }
}
