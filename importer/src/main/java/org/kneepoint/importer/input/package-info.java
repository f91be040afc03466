/**
 * A file as the readers take it: its bytes read once (after the size limit is checked), their
 * SHA-256 — the identity of an import — and their text, decoded as strict UTF-8; and
 * {@link org.kneepoint.importer.input.Excerpt}, the short quote of input that messages show.
 */
package org.kneepoint.importer.input;
