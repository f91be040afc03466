/** How the web application is served: address, port, the write token and the body limits. */
package org.kneepoint.server.app.serving;
