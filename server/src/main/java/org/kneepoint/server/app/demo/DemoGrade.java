package org.kneepoint.server.app.demo;

import java.util.List;

/**
 * One invented demo grade: its values at 20 °C, linear temperature coefficients and the
 * temperatures at which curves are generated. Nothing here is a real product's data.
 *
 * @param name         invented grade name
 * @param family       material family
 * @param supplier     invented supplier
 * @param density      kg/m³ (typical of the family, from memory)
 * @param br           remanence at 20 °C, T
 * @param hcj          intrinsic coercivity at 20 °C, A/m
 * @param muRec        recoil permeability
 * @param alpha        temperature coefficient of Br, %/K
 * @param beta         temperature coefficient of HcJ, %/K
 * @param roundness    knee shape: width of the knee as a fraction of HcJ (larger is rounder); for AlNiCo the exponent shape
 * @param celsius      temperatures of the generated curves, °C
 * @param cgsUnits     whether the curve file is written in kOe and kG instead of kA/m and T
 * @param price        invented price per kilogram in a demo currency, set on the grade after import
 */
record DemoGrade(String name, String family, String supplier, double density, double br, double hcj, double muRec,
        double alpha, double beta, double roundness, List<Integer> celsius, boolean cgsUnits, double price) {
}
