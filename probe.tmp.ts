import * as W from './src/water/if97/index.js';
const S = (c: number) => W.statusName(c);
const out = new W.WaterState(); const L = new W.WaterProperties(); const V = new W.WaterProperties();
const Tc = W.T_CRITICAL, pc = W.P_CRITICAL;
for (const d of [1e-3, 1e-6, 1e-9, 1e-11, 1e-12, 0]) {
  const T = Tc - d * Tc;
  const st = W.saturationAtT(T, L, V);
  console.log('satT', d, S(st), st === 0 ? [L.rho, V.rho, V.h - L.h] : '');
}
for (const d of [1e-3, 1e-6, 1e-9, 1e-12, 1e-15, 0]) {
  const p = pc * (1 - d);
  const st = W.saturationAtP(p, L, V);
  console.log('satP', d, S(st), st === 0 ? [L.T, L.rho, V.rho, V.h - L.h] : '');
}
// critical state flashes
W.region3(W.RHO_CRITICAL, Tc, L);
console.log('crit', L.p, L.h, L.s);
console.log('ph crit', S(W.stateFromPH(pc, L.h, out)), out.T, out.phase, out.region);
console.log('ps crit', S(W.stateFromPS(pc, L.s, out)), out.T);
console.log('hs crit', S(W.stateFromHS(L.h, L.s, out)), out.p, out.T);
for (const dp of [1e-3, 5e-3, 1e-2, 1, 100]) {
  const p = pc - dp;
  for (const h of [1.9e6, 2.0e6, 2.087e6, 2.1e6, 2.2e6]) {
    const st = W.stateFromPH(p, h, out);
    if (st !== 0) console.log('ph fail', dp, h, S(st));
  }
}
const T3 = Tc - 3e-6; console.log('TX', S(W.stateFromTX(T3, 0.125, out)), out.phase, out.h, out.s);
const h = out.h, s = out.s; const back = new W.WaterState();
console.log('PH back', S(W.stateFromPH(out.p, h, back)), back.phase, back.x);
console.log('HS back', S(W.stateFromHS(h, s, back)), back.phase, back.p - out.p);
// phase label of saturated liquid at 21.89 MPa
W.saturationAtP(21.89e6, L, V);
console.log('PH satliq', S(W.stateFromPH(21.89e6, L.h, back)), back.phase, back.region, back.x);
