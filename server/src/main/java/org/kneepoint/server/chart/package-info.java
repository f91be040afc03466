/**
 * Charts drawn with JFreeChart and written as SVG with JFreeSVG: units on every axis, a legend,
 * one colour per temperature. Values arrive in SI and are scaled only for the axes (kA/m, T).
 */
package org.kneepoint.server.chart;
