/**
 * Persistence of the material library: Flyway migrations ({@code db/migration}), jOOQ classes
 * generated from them at build time ({@code org.kneepoint.db.jooq}, never used outside this
 * package), and stores mapping rows to the value types of {@code org.kneepoint.fitter.library}.
 * Embedded H2 file database by default, PostgreSQL when given a JDBC URL. Every import, restore
 * or edit runs in one transaction: on any error nothing is written.
 */
package org.kneepoint.db;
