/**
 * Grade selection (docs/design.md §2, workflow 4): every grade checked against one set of requirements on its
 * load line at temperature ({@link org.kneepoint.fitter.loadline.DesignCheck}), with pass or fail, the
 * shortfall of each requirement it misses, and a ranking by flux, knee margin, loss, maximum working
 * temperature or price. Values in SI; losses as fractions.
 */
package org.kneepoint.fitter.select;
