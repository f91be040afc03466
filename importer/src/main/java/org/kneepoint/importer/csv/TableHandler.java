package org.kneepoint.importer.csv;

/** What a reader does with the parts of a delimited table as {@link TableScanner} meets them. */
public interface TableHandler {

    /** A {@code # key: value} line before the header. */
    void metadata(MetadataLine entry, int line);

    /** The header row, split by the delimiter it revealed. */
    void header(String[] cells, Delimiter delimiter, int line);

    /** A data row, split by the header's delimiter. */
    void row(String[] cells, int line);
}
