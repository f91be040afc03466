/**
 * The one set of physical limits that every way into Kneepoint applies — file import (text and
 * JSON curve files, susceptibility tables), restore of a backup, and the edit and query paths:
 * what no known material reaches ({@link PhysicalLimits}), the shape a measured curve must have
 * ({@link CurvePlausibility}) and the characters a stored name may hold ({@link NameCharacters}).
 * Pure values and checks in SI; each limit names its source or says "from memory" or "common
 * practice". The sources are listed in docs/references.md §9.
 */
package org.kneepoint.fitter.limits;
