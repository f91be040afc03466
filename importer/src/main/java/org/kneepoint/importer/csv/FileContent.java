package org.kneepoint.importer.csv;

/** What an input file holds once read: curves of one grade, or a susceptibility table. */
public sealed interface FileContent permits CurveFile, SusceptibilityTable {

    /** The file's name, as messages name it. */
    String source();
}
