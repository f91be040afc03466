package org.kneepoint.server.app.imports;

/**
 * Where an import has got: the stage, the file it is at, and what is done so far.
 *
 * @param stage         what the import is doing now
 * @param file          the file's name; null while storing
 * @param filesChecked  files read and checked (or skipped as already imported)
 * @param files         files in the import
 * @param curvesChecked curves characterized
 * @param curvesFound   curves in the files read so far (all of them once every file is checked)
 */
public record ImportStep(Stage stage, String file, int filesChecked, int files, int curvesChecked, int curvesFound) {

    /** The stages of an import: each file is read, validated and its curves characterized; then everything is stored. */
    public enum Stage { READING, VALIDATING, CHARACTERIZING, STORING }

    public ImportStep {
        if (filesChecked < 0 || filesChecked > files || curvesChecked < 0 || curvesChecked > curvesFound) {
            throw new IllegalArgumentException("import step " + stage + ": " + filesChecked + " of " + files + " files, "
                    + curvesChecked + " of " + curvesFound + " curves");
        }
    }

    /** True once every file has been read and checked, so that {@link #curvesFound} is the import's number of curves. */
    public boolean everyFileChecked() {
        return filesChecked == files;
    }
}
