package org.kneepoint.server.app;

import java.nio.file.Path;
import org.kneepoint.db.DatabaseLocation;
import org.kneepoint.db.Library;
import org.kneepoint.db.LibraryReader;
import org.kneepoint.server.app.demo.DemoLoader;

/** The demo library in a fresh H2 database in a test's temporary folder, for the use-case tests of {@code app}. */
public final class DemoLibraryFixture implements AutoCloseable {

    private final Library library;

    private DemoLibraryFixture(Library library) {
        this.library = library;
    }

    /** Opens a new library in {@code folder} and loads the demo grades and materials. */
    public static DemoLibraryFixture in(Path folder) {
        Library library = Library.open(DatabaseLocation.ofFolder(folder.resolve("library")));
        DemoLoader.load(library);
        return new DemoLibraryFixture(library);
    }

    /** An empty library in {@code folder}. */
    public static Library empty(Path folder) {
        return Library.open(DatabaseLocation.ofFolder(folder.resolve("empty")));
    }

    public Library library() {
        return library;
    }

    public LibraryReader reader() {
        return library.reader();
    }

    @Override
    public void close() {
        library.close();
    }
}
