/**
 * Persistence of the material library: Flyway migrations, generated jOOQ classes and stores that
 * map rows to {@code fitter} types. Embedded H2 by default, PostgreSQL by JDBC URL.
 */
package org.kneepoint.db;
