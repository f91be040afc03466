/**
 * Load lines, operating points and flux loss (DESIGN §4), every value in SI (A/m, T, K).
 * The load line B = −μ0·Pc·(H + Ha) meets the grade's intrinsic curve J(H) at temperature T; below
 * the knee (J = 0.9·Br) the magnet recoils along J = Br' + μ0·(μrec − 1)·H and loses
 * 1 − Br'/Br(T) for good. Temperature enters through {@link org.kneepoint.fitter.loadline.TemperatureModel},
 * for now the linear law Br(T) = Br0·(1 + α·(T − T0)), HcJ(T) = HcJ0·(1 + β·(T − T0)).
 */
package org.kneepoint.fitter.loadline;
