/** The demo library: invented grades and susceptibility data, labelled invented, loaded on request. */
package org.kneepoint.server.app.demo;
