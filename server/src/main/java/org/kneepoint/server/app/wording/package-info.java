/** Temperatures and lengths in the words of the application's descriptions (°C, mm); every value inside stays SI. */
package org.kneepoint.server.app.wording;
