package org.phasewright.io.write;

import java.io.BufferedOutputStream;
import java.io.BufferedWriter;
import java.io.IOException;
import java.io.OutputStream;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.channels.Channels;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.util.concurrent.ThreadLocalRandom;
import org.phasewright.io.OutputException;

/**
 * Writes a file so that it either appears complete or not at all.
 *
 * <p>Method: the content goes to a hidden temporary file in the target's own folder
 * ({@code .name.<random>.part}), is forced to the disk, and is then published in one step: by
 * an atomic rename when replacing is allowed, or, when it is not, by creating a hard link under
 * the target name (which fails if the name exists, so no race can overwrite a file), falling
 * back to a rename after an existence check on file systems without hard links. On any failure
 * (including an exception thrown by the content writer) the temporary file is deleted and the
 * target is left as it was.
 */
public final class AtomicFile {

    /** Writes the content of a file to a stream. */
    @FunctionalInterface
    public interface Content {
        void writeTo(OutputStream out) throws IOException;
    }

    /** Writes the content of a text file (UTF-8). */
    @FunctionalInterface
    public interface TextContent {
        void writeTo(Writer out) throws IOException;
    }

    private AtomicFile() {
    }

    /** Writes UTF-8 text atomically; see {@link #write(Path, boolean, Content)}. */
    public static void writeText(Path target, boolean replace, TextContent content) {
        write(target, replace, out -> {
            Writer w = new BufferedWriter(new OutputStreamWriter(out, StandardCharsets.UTF_8), 1 << 16);
            content.writeTo(w);
            w.flush();
        });
    }

    /**
     * Writes {@code target} atomically.
     *
     * @param replace whether an existing {@code target} may be replaced
     * @throws OutputException when the target exists (and {@code replace} is false) or cannot
     *                         be written; runtime exceptions from {@code content} pass through
     *                         unchanged, after the temporary file has been removed
     */
    public static void write(Path target, boolean replace, Content content) {
        Path absolute = target.toAbsolutePath();
        Path dir = absolute.getParent();
        if (!replace && Files.exists(absolute)) {
            throw exists(target);
        }
        if (dir == null || !Files.isDirectory(dir)) {
            throw new OutputException(OutputException.Kind.NOT_WRITABLE, target, "the folder " + dir + " does not exist");
        }
        Path temp = dir.resolve("." + absolute.getFileName() + "." + Long.toHexString(ThreadLocalRandom.current().nextLong()) + ".part");
        boolean published = false;
        try {
            try (FileChannel ch = FileChannel.open(temp, StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE);
                 OutputStream out = new BufferedOutputStream(Channels.newOutputStream(ch), 1 << 16)) {
                content.writeTo(out);
                out.flush();
                ch.force(true);
            }
            publish(temp, absolute, target, replace);
            published = true;
        } catch (IOException e) {
            throw new OutputException(OutputException.Kind.NOT_WRITABLE, target, "cannot be written: " + e, e);
        } finally {
            if (!published) {
                try {
                    Files.deleteIfExists(temp);
                } catch (IOException ignored) {
                    // the temporary file is hidden and named .part; nothing else to do
                }
            }
        }
    }

    private static void publish(Path temp, Path absolute, Path target, boolean replace) throws IOException {
        if (replace) {
            try {
                Files.move(temp, absolute, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(temp, absolute, StandardCopyOption.REPLACE_EXISTING);
            }
            return;
        }
        try {
            Files.createLink(absolute, temp);
            Files.delete(temp);
        } catch (FileAlreadyExistsException e) {
            throw exists(target);
        } catch (UnsupportedOperationException | IOException e) {
            if (Files.exists(absolute)) {
                throw exists(target);
            }
            Files.move(temp, absolute, StandardCopyOption.ATOMIC_MOVE);
        }
    }

    private static OutputException exists(Path target) {
        return new OutputException(OutputException.Kind.EXISTS, target, "the file exists; choose another name or allow replacing it");
    }
}
