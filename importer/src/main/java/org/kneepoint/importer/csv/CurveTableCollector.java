package org.kneepoint.importer.csv;

/** A {@link TableHandler} that turns what it was fed into a {@link CurveFile}. */
public interface CurveTableCollector extends TableHandler {

    CurveFile result();
}
