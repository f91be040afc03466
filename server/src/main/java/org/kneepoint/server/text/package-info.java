/**
 * How results look outside the program: JSON documents (SI units, camelCase keys, null for
 * "not reached") and readable tables in engineering units (T, kA/m, kJ/m³, °C).
 */
package org.kneepoint.server.text;
