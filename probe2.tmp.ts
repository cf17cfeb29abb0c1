import * as W from './src/water/if97/index.js';
const L = new W.WaterProperties(); const V = new W.WaterProperties();
const Tc = W.T_CRITICAL;
for (let e = -5; e >= -10; e -= 0.25) {
  const dT = Tc * 10 ** e;
  const T = Tc - dT;
  const st = W.saturationAtT(T, L, V);
  const ps = W.saturationPressure(T);
  const pr = new Float64Array(2);
  W.region3Pressure(322, T, pr);
  console.log(e.toFixed(2), dT.toExponential(3), W.statusName(st), st === 0 ? (L.rho - 322).toExponential(4) + ' ' + (V.rho - 322).toExponential(4) + ' hfg=' + (V.h - L.h).toExponential(3) : '', 'p3(rhoc)-ps', (pr[0] - ps).toExponential(3));
}
