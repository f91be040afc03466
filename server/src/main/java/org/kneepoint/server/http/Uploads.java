package org.kneepoint.server.http;

import org.kneepoint.server.app.serving.ServerSettings;

import io.javalin.http.Context;
import io.javalin.http.UploadedFile;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.stream.Stream;
import org.kneepoint.fitter.error.BadInputException;

/**
 * The files of a multipart upload, copied into a private temporary folder under their own base
 * names (no folders, no control characters) so that the import planner reads them like files
 * named on the command line. Closing deletes the folder.
 */
public final class Uploads implements AutoCloseable {

    private final Path folder;
    private final List<Path> files;

    private Uploads(Path folder, List<Path> files) {
        this.folder = folder;
        this.files = List.copyOf(files);
    }

    public static Uploads of(Context context) {
        List<UploadedFile> uploaded = parts(context);
        if (uploaded.isEmpty()) {
            throw new BadInputException("no file in the upload; send multipart/form-data with one or more parts named 'file'");
        }
        Path folder = createFolder();
        List<Path> files = new ArrayList<>();
        Set<String> names = new HashSet<>();
        try {
            for (UploadedFile file : uploaded) {
                String name = safeName(file.filename());
                if (!names.add(name)) {
                    throw new BadInputException("two uploaded files are both named '" + name + "'");
                }
                Path path = folder.resolve(name);
                try (InputStream in = file.content()) {
                    Files.copy(in, path);
                }
                files.add(path);
            }
        } catch (IOException | RuntimeException e) {
            delete(folder);
            if (e instanceof IOException io) {
                throw new UncheckedIOException("cannot store an uploaded file", io);
            }
            throw (RuntimeException) e;
        }
        return new Uploads(folder, files);
    }

    /**
     * The file parts of the request. A body that outgrows the upload limit while it streams (no
     * Content-Length to check in advance) is refused as too large; a body that is not multipart is bad input.
     */
    private static List<UploadedFile> parts(Context context) {
        try {
            return context.uploadedFiles();
        } catch (Exception e) {
            for (Throwable cause = e; cause != null; cause = cause.getCause()) {
                if (cause.getMessage() != null && cause.getMessage().contains("max length exceeded")) {
                    throw new RequestRefused(413, "TOO_LARGE", "the upload is larger than " + ServerSettings.MAX_UPLOAD_BYTES + " bytes");
                }
            }
            throw new BadInputException("the upload is not readable multipart/form-data (" + e.getClass().getSimpleName() + ")");
        }
    }

    public List<Path> files() {
        return files;
    }

    @Override
    public void close() {
        delete(folder);
    }

    static String safeName(String filename) {
        String name = filename == null ? "" : filename.replace('\\', '/');
        name = name.substring(name.lastIndexOf('/') + 1).replaceAll("[\\p{Cntrl}]", "").strip();
        if (name.isEmpty() || name.equals(".") || name.equals("..")) {
            throw new BadInputException("an uploaded file has no name; give each part a filename");
        }
        return name.length() > 200 ? name.substring(name.length() - 200) : name;
    }

    private static Path createFolder() {
        try {
            return Files.createTempDirectory("kneepoint-upload-");
        } catch (IOException e) {
            throw new UncheckedIOException("cannot create a folder for the upload", e);
        }
    }

    private static void delete(Path folder) {
        try (Stream<Path> paths = Files.walk(folder)) {
            paths.sorted(Comparator.reverseOrder()).forEach(path -> path.toFile().delete());
        } catch (IOException e) {
            folder.toFile().deleteOnExit();
        }
    }
}
