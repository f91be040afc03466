/**
 * The physical limits of {@code org.kneepoint.fitter.limits} applied to what a file holds, each
 * refusal naming the file, line and column (or the field of a JSON document) where the implausible
 * value is. Every reader — text and JSON curve files, susceptibility tables, backups — goes
 * through here, so all of them refuse the same things with the same words.
 */
package org.kneepoint.importer.plausible;
