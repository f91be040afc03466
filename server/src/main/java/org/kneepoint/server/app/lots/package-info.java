/**
 * Use cases of lot qualification (docs/lots.md): setting and showing a grade's specifications,
 * importing a delivered lot's curves apart from the grade's reference curves, listing lots,
 * checking a lot against the specification and the reference curves, and the history of lots with
 * their process capability. Requests in, complete result records out; the physics is
 * {@link org.kneepoint.fitter.qualification}.
 */
package org.kneepoint.server.app.lots;
