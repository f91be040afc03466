/**
 * The web application: server-rendered pages (Library, Grade, Check, Select, Field, Import, a job's page) and
 * the offline design-check report. Each page class turns what it is given into a view record of plain values;
 * a JTE template ({@code server/src/main/jte}, precompiled into this package at build time) writes the HTML,
 * escaped by default for where each value stands; one layout template frames every page. No scripts.
 * {@link org.kneepoint.server.web.WebApplication} starts the pages and the JSON API on one server.
 */
package org.kneepoint.server.web;
