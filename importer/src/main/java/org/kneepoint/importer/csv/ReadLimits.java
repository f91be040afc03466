package org.kneepoint.importer.csv;

/**
 * How large an input the readers accept. The default, 64 MiB, holds a few million points; larger
 * files are refused before any byte is parsed, so a mistaken upload cannot exhaust memory.
 *
 * @param maxBytes largest accepted file size in bytes
 */
public record ReadLimits(long maxBytes) {

    public static final long DEFAULT_MAX_BYTES = 64L * 1024 * 1024;

    public ReadLimits {
        if (maxBytes <= 0) {
            throw new IllegalArgumentException("the file size limit must be positive, got " + maxBytes + " bytes");
        }
    }

    public static ReadLimits defaults() {
        return new ReadLimits(DEFAULT_MAX_BYTES);
    }
}
