package trailcross.io;

import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;

/**
 * A text file that carries a checksum of its own content, so that a damaged file (cut short, edited, a disk
 * error) is recognised instead of read back: the content, then a last line {@code #sha256 <hex>} holding the
 * SHA-256 digest (FIPS 180-4, the JDK's MessageDigest) of everything before it. Written atomically
 * ({@link AtomicFile}).
 */
public final class SealedFile {

    /** What starts the checksum line. */
    public static final String MARK = "#sha256 ";

    /** A file whose checksum is missing or does not match its content. */
    public static final class DamagedException extends IllegalArgumentException {
        private static final long serialVersionUID = 1L;

        /**
         * @param message what is wrong, naming the file
         */
        public DamagedException(String message) {
            super(message);
        }
    }

    private SealedFile() {
    }

    /**
     * @param file the target (replaced atomically)
     * @param content what to write
     */
    public static void write(Path file, AtomicFile.Content content) {
        StringWriter sw = new StringWriter();
        try {
            content.write(sw);
        } catch (IOException e) {
            throw new UncheckedIOException(file + ": cannot write: " + e.getMessage(), e);
        }
        String text = sw.toString();
        if (!text.isEmpty() && !text.endsWith("\n")) {
            text += "\n";
        }
        String body = text;
        AtomicFile.write(file, w -> {
            w.write(body);
            w.write(MARK + digest(body) + "\n");
        });
    }

    /**
     * @param file a sealed file
     * @return its content without the checksum line
     * @throws DamagedException when the checksum is missing or does not match
     * @throws IllegalArgumentException when the file cannot be read
     */
    public static String read(Path file) {
        String all;
        try {
            all = Files.readString(file, StandardCharsets.UTF_8);
        } catch (NoSuchFileException e) {
            throw new IllegalArgumentException(file + ": no such file", e);
        } catch (IOException e) {
            throw new IllegalArgumentException(file + ": cannot read: " + e.getMessage(), e);
        }
        int k = all.lastIndexOf(MARK);
        if (k < 0 || (k > 0 && all.charAt(k - 1) != '\n') || !all.endsWith("\n")) {
            throw new DamagedException(file + ": damaged: no checksum line (cut short, or not written by trailcross)");
        }
        String body = all.substring(0, k);
        String sum = all.substring(k + MARK.length()).strip();
        if (!sum.equals(digest(body))) {
            throw new DamagedException(file + ": damaged: its checksum does not match its content");
        }
        return body;
    }

    private static String digest(String text) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(text.getBytes(StandardCharsets.UTF_8)));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is missing from this JVM", e);
        }
    }
}
