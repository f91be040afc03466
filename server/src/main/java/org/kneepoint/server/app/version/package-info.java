/** The program's version, read from the build. */
package org.kneepoint.server.app.version;
