/**
 * A plain loop, term by term, over a fluid file's coefficients (Math.pow for every power): the test
 * oracle for the generated Helmholtz kernels (src/fluids/kernels.generated.ts). Each term's
 * derivatives are written from its own formula (IAPWS R6-95(2018) Tables 4 and 5 for the
 * non-analytic terms), not from the generator's grouped sums.
 *
 * @module
 */
import type { FluidCoefficients } from '../../scripts/generate-kernels.js';

/**
 * αʳ and its derivatives [αʳ, αʳ_δ, αʳ_δδ, αʳ_τ, αʳ_ττ, αʳ_δτ] into `out`, and the sums of the
 * terms' absolute contributions into `size` (the scale against which rounding is measured).
 */
export function referenceResidual(f: FluidCoefficients, delta: number, tau: number, out: number[], size: number[]): void {
  out.fill(0, 0, 6);
  size.fill(0, 0, 6);
  const add = (v: number[]) => {
    for (let i = 0; i < 6; i++) {
      out[i]! += v[i]!;
      size[i]! += Math.abs(v[i]!);
    }
  };
  const r = f.residual;
  const power = (n: number, d: number, t: number, c: number) => {
    const v = n * Math.pow(delta, d) * Math.pow(tau, t) * (c === 0 ? 1 : Math.exp(-Math.pow(delta, c)));
    const k = c === 0 ? 0 : c * Math.pow(delta, c);
    add([
      v,
      (v * (d - k)) / delta,
      (v * ((d - k) * (d - 1 - k) - c * k)) / (delta * delta),
      (v * t) / tau,
      (v * t * (t - 1)) / (tau * tau),
      (v * t * (d - k)) / (delta * tau),
    ]);
  };
  r.polynomial?.n.forEach((n, i) => power(n, r.polynomial!.d[i]!, r.polynomial!.t[i]!, 0));
  r.exponential?.n.forEach((n, i) => power(n, r.exponential!.d[i]!, r.exponential!.t[i]!, r.exponential!.c[i]!));
  const g = r.gaussian;
  g?.n.forEach((n, i) => {
    const d = g.d[i]!;
    const t = g.t[i]!;
    const a = g.alpha[i]!;
    const b = g.beta[i]!;
    const v = n * Math.pow(delta, d) * Math.pow(tau, t) * Math.exp(-a * (delta - g.epsilon[i]!) ** 2 - b * (tau - g.gamma[i]!) ** 2);
    const fd = d / delta - 2 * a * (delta - g.epsilon[i]!);
    const ft = t / tau - 2 * b * (tau - g.gamma[i]!);
    add([v, v * fd, v * (fd * fd - d / (delta * delta) - 2 * a), v * ft, v * (ft * ft - t / (tau * tau) - 2 * b), v * fd * ft]);
  });
  const na = r.nonAnalytic;
  na?.n.forEach((n, i) => {
    const a = na.a[i]!;
    const b = na.b[i]!;
    const B = na.B[i]!;
    const C = na.C[i]!;
    const D = na.D[i]!;
    const A = na.A[i]!;
    const be = na.beta[i]!;
    const dm = delta - 1;
    const q = dm * dm;
    const theta = 1 - tau + A * Math.pow(q, 1 / (2 * be));
    const Delta = theta * theta + B * Math.pow(q, a);
    const psi = Math.exp(-C * q - D * (tau - 1) ** 2);
    // R6-95(2018) Table 5, as printed (the 1/(δ − 1) form; the test avoids δ = 1)
    const dDelta = dm * (A * theta * (2 / be) * Math.pow(q, 1 / (2 * be) - 1) + 2 * B * a * Math.pow(q, a - 1));
    const ddDelta =
      dDelta / dm +
      q * (4 * B * a * (a - 1) * Math.pow(q, a - 2) + 2 * A * A * (1 / be) ** 2 * Math.pow(Math.pow(q, 1 / (2 * be) - 1), 2) + A * theta * (4 / be) * (1 / (2 * be) - 1) * Math.pow(q, 1 / (2 * be) - 2));
    const Db = Math.pow(Delta, b);
    const Db_d = b * Math.pow(Delta, b - 1) * dDelta;
    const Db_dd = b * (Math.pow(Delta, b - 1) * ddDelta + (b - 1) * Math.pow(Delta, b - 2) * dDelta * dDelta);
    const Db_t = -2 * theta * b * Math.pow(Delta, b - 1);
    const Db_tt = 2 * b * Math.pow(Delta, b - 1) + 4 * theta * theta * b * (b - 1) * Math.pow(Delta, b - 2);
    const Db_dt = -A * b * (2 / be) * Math.pow(Delta, b - 1) * dm * Math.pow(q, 1 / (2 * be) - 1) - 2 * theta * b * (b - 1) * Math.pow(Delta, b - 2) * dDelta;
    const psi_d = -2 * C * dm * psi;
    const psi_dd = (2 * C * q - 1) * 2 * C * psi;
    const psi_t = -2 * D * (tau - 1) * psi;
    const psi_tt = (2 * D * (tau - 1) ** 2 - 1) * 2 * D * psi;
    const psi_dt = 4 * C * D * dm * (tau - 1) * psi;
    add([
      n * Db * delta * psi,
      n * (Db * (psi + delta * psi_d) + Db_d * delta * psi),
      n * (Db * (2 * psi_d + delta * psi_dd) + 2 * Db_d * (psi + delta * psi_d) + Db_dd * delta * psi),
      n * delta * (Db_t * psi + Db * psi_t),
      n * delta * (Db_tt * psi + 2 * Db_t * psi_t + Db * psi_tt),
      n * (Db * (psi_t + delta * psi_dt) + delta * Db_d * psi_t + Db_t * (psi + delta * psi_d) + Db_dt * delta * psi),
    ]);
  });
}

/** α° − ln δ, α°_τ, α°_ττ into `out`, absolute term sizes into `size`. */
export function referenceIdeal(f: FluidCoefficients, tau: number, out: number[], size: number[]): void {
  const i = f.ideal;
  const terms: number[][] = [
    [i.constant, 0, 0],
    [i.tau * tau, i.tau, 0],
    [i.lnTau * Math.log(tau), i.lnTau / tau, -i.lnTau / (tau * tau)],
  ];
  i.power.n.forEach((n, k) => {
    const t = i.power.t[k]!;
    terms.push([n * Math.pow(tau, t), n * t * Math.pow(tau, t - 1), n * t * (t - 1) * Math.pow(tau, t - 2)]);
  });
  i.planckEinstein.n.forEach((n, k) => {
    const th = i.planckEinstein.theta[k]!;
    const e = Math.exp(-th * tau);
    terms.push([n * Math.log(1 - e), n * th * (1 / (1 - e) - 1), -n * th * th * (e / ((1 - e) * (1 - e)))]);
  });
  out.fill(0, 0, 3);
  size.fill(0, 0, 3);
  for (const v of terms)
    for (let j = 0; j < 3; j++) {
      out[j]! += v[j]!;
      size[j]! += Math.abs(v[j]!);
    }
}
