/**
 * Design use cases: a check, a duty sequence and a grade selection against a load line given by Pc or a magnet
 * shape; the grade is one of the library or typed in ({@link org.kneepoint.server.app.design.GradeSource} holds
 * that rule and {@link org.kneepoint.server.app.design.DesignLimits} the input limits, for every front end).
 */
package org.kneepoint.server.app.design;
