package org.kneepoint.server.web;

/**
 * What a page's write form carries ({@code tokenField.jte}): the session's form token as a hidden field, and a field
 * for the server's token when the server needs one.
 */
record FormAccess(String formToken, boolean tokenRequired) {
}
