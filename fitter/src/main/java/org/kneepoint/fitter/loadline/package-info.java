/**
 * Load lines, operating points and flux loss (docs/design.md §4), every value in SI (A/m, T, K).
 * The load line B = −μ0·Pc·(H + Ha) meets the grade's intrinsic curve J(H) at temperature T (Ha in the
 * circuit convention; a uniform external field Hext on a free magnet enters as Ha = Hext/(1 − N),
 * {@link org.kneepoint.fitter.loadline.AppliedField}); from the operating point the magnet recoils along
 * J = Br' + μ0·(μrec − 1)·H and loses 1 − Br'/Br(T) for good, with no threshold at the knee (J = 0.9·Br),
 * which is reported beside the loss. The working temperatures are where that loss reaches a limit
 * ({@link org.kneepoint.fitter.loadline.WorkingTemperatures}); a model's range stops below the family's
 * Curie temperature and where its curve ends ({@link org.kneepoint.fitter.loadline.BoundedTemperatureModel}).
 * Temperature enters through {@link org.kneepoint.fitter.loadline.TemperatureModel},
 * for now the linear law Br(T) = Br0·(1 + α·(T − T0)), HcJ(T) = HcJ0·(1 + β·(T − T0)).
 */
package org.kneepoint.fitter.loadline;
