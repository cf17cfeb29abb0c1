/**
 * The SI core of the Helmholtz-energy engine: a compiled fluid ({@link FluidModel}), the caller's
 * working context ({@link FluidContext}), the output object ({@link FluidState}) and the
 * properties at (T, ρ).
 *
 * The reduced Helmholtz energy α = a/(RT) = α°(δ, τ) + αʳ(δ, τ), δ = ρ/ρᵣ, τ = Tᵣ/T, gives every
 * property (IAPWS R6-95(2018) Table 3; the same relations hold for every fluid of this form):
 *   p = ρRT(1 + δαʳ_δ),  u = RTτ(α°_τ + αʳ_τ),  h = RT(1 + τ(α°_τ + αʳ_τ) + δαʳ_δ),
 *   s = R(τ(α°_τ + αʳ_τ) − α° − αʳ),  g = RT(1 + α° + αʳ + δαʳ_δ),  cv = −Rτ²(α°_ττ + αʳ_ττ),
 *   cp = cv + R(1 + δαʳ_δ − δταʳ_δτ)²/(1 + 2δαʳ_δ + δ²αʳ_δδ),
 *   w² = RT(1 + 2δαʳ_δ + δ²αʳ_δδ − (1 + δαʳ_δ − δταʳ_δτ)²/(τ²(α°_ττ + αʳ_ττ))),
 *   μ_JT = −(δαʳ_δ + δ²αʳ_δδ + δταʳ_δτ) / ((1 + δαʳ_δ − δταʳ_δτ)² − τ²(α°_ττ + αʳ_ττ)(1 + 2δαʳ_δ + δ²αʳ_δδ)) / (Rρ).
 *
 * @module
 */
import { Status, type StatusCode } from '../core/status.js';
import type { FluidDefinition } from './definition.js';

/** A generated residual kernel: out[0..5] = αʳ, αʳ_δ, αʳ_δδ, αʳ_τ, αʳ_ττ, αʳ_δτ. */
export type ResidualKernel = (delta: number, tau: number, out: Float64Array) => void;
/** A generated ideal-gas kernel: out[0..2] = α° − ln δ, α°_τ, α°_ττ. */
export type IdealKernel = (tau: number, out: Float64Array) => void;

/** Phase codes of a {@link FluidState}. */
export const FLUID_PHASE = { liquid: 0, vapor: 1, twoPhase: 2, supercritical: 3 } as const;

/** A fluid's equation of state, compiled: constants as numbers and its generated kernels. */
export class FluidModel {
  /** Specific gas constant of the equation, J/(kg·K). */
  readonly R: number;
  /** Molar mass, kg/mol. */
  readonly M: number;
  /** Reducing temperature (K) and density (kg/m³). */
  readonly Tr: number;
  readonly rhor: number;
  /** Critical point. */
  readonly Tc: number;
  readonly pc: number;
  readonly rhoc: number;
  /** Triple point. */
  readonly Tt: number;
  readonly pt: number;
  /** Range: T from Tmin to Tmax (K), p to pMax (Pa), densities to rhoMax (kg/m³). */
  readonly Tmin: number;
  readonly Tmax: number;
  readonly pMax: number;
  readonly rhoMax: number;
  /** Ancillary equations (starting values only). */
  readonly psN: Float64Array;
  readonly psT: Float64Array;
  readonly rlN: Float64Array;
  readonly rlT: Float64Array;
  readonly rvN: Float64Array;
  readonly rvT: Float64Array;
  /**
   * The ancillaries' exponents as multiples k/q of one root ϑ^(1/q) (q ≤ 24, shared by the three
   * equations), so that ϑ^t is a short product instead of Math.pow; q = 0 when there is none.
   */
  readonly ancillaryRoot: number;
  /** True when the liquid-density ancillary is ln(ρ'/ρc) = Σ n ϑ^t (else ρ'/ρc = 1 + Σ n ϑ^t). */
  readonly liquidLogarithmic: boolean;
  readonly psK: Int32Array;
  readonly rlK: Int32Array;
  readonly rvK: Int32Array;
  readonly pressureMargin: number;

  constructor(
    readonly name: string,
    definition: FluidDefinition,
    readonly residual: ResidualKernel,
    readonly ideal: IdealKernel,
  ) {
    const d = definition;
    this.R = d.gasConstant.value;
    this.M = d.molarMass.value;
    this.Tr = d.reducing.T;
    this.rhor = d.reducing.rho;
    this.Tc = d.critical.T;
    this.pc = d.critical.p;
    this.rhoc = d.critical.rho;
    this.Tt = d.triple.T;
    this.pt = d.triple.p;
    this.Tmin = d.range.Tmin;
    this.Tmax = d.range.Tmax;
    this.pMax = d.range.pMax;
    this.rhoMax = d.range.rhoMax;
    const a = d.ancillary;
    this.psN = Float64Array.from(a.vaporPressure.n);
    this.psT = Float64Array.from(a.vaporPressure.t);
    this.rlN = Float64Array.from(a.liquidDensity.n);
    this.rlT = Float64Array.from(a.liquidDensity.t);
    this.rvN = Float64Array.from(a.vaporDensity.n);
    this.rvT = Float64Array.from(a.vaporDensity.t);
    this.pressureMargin = a.pressureMargin;
    const all = [...a.vaporPressure.t, ...a.liquidDensity.t, ...a.vaporDensity.t];
    let q = 0;
    for (let c = 1; c <= 24 && q === 0; c++) if (all.every((t) => t > 0 && Math.abs(t * c - Math.round(t * c)) < 1e-9)) q = c;
    this.ancillaryRoot = q;
    this.liquidLogarithmic = a.liquidDensity.logarithmic === true;
    const ks = (t: readonly number[]) => Int32Array.from(t, (x) => (q === 0 ? 0 : Math.round(x * q)));
    this.psK = ks(a.vaporPressure.t);
    this.rlK = ks(a.liquidDensity.t);
    this.rvK = ks(a.vaporDensity.t);
  }
}

/** Every property of a state. In two-phase states cp, cv, w and jouleThomson are NaN (not defined). */
export class FluidState {
  /** Temperature, K. */
  T = NaN;
  /** Pressure, Pa. */
  p = NaN;
  /** Density, kg/m³, and specific volume, m³/kg. */
  rho = NaN;
  v = NaN;
  /** Specific internal energy, enthalpy (J/kg), entropy (J/(kg·K)), Gibbs energy (J/kg). */
  u = NaN;
  h = NaN;
  s = NaN;
  g = NaN;
  /** Isochoric and isobaric heat capacity, J/(kg·K). */
  cv = NaN;
  cp = NaN;
  /** Speed of sound, m/s. */
  w = NaN;
  /** Joule–Thomson coefficient (∂T/∂p)_h, K/Pa. */
  jouleThomson = NaN;
  /** (∂p/∂ρ)_T in Pa·m³/kg and (∂p/∂T)_ρ in Pa/K. */
  dpdrho = NaN;
  dpdT = NaN;
  /** Vapour mass fraction; NaN in single-phase states. */
  x = NaN;
  /** One of {@link FLUID_PHASE}. */
  phase = 0;
}

/**
 * A caller's working context for one fluid: the model and the scratch arrays its solvers use.
 * Create one per fluid and thread (it holds no results between calls that change an answer).
 */
export class FluidContext {
  /** αʳ and derivatives, α° − ln δ and derivatives. */
  readonly ar = new Float64Array(6);
  readonly a0 = new Float64Array(3);
  /** Saturated states of the last saturation solve (scratch). */
  readonly liquid = new FluidState();
  readonly vapor = new FluidState();
  readonly work = new FluidState();
  /** Starting state of a flash (scratch). */
  readonly start = new FluidState();
  /** Saturation solve results: δ', δ'' and the pressure (scratch). */
  satDL = NaN;
  satDV = NaN;
  satP = NaN;
  /** Saturation temperature of the last saturation solve by pressure (scratch). */
  satT = NaN;

  constructor(readonly model: FluidModel) {}
}

/** x^k for an integer k ≥ 0 by binary powering. */
function integerPower(x: number, k: number): number {
  let r = 1;
  let b = x;
  let e = k;
  while (e > 0) {
    if ((e & 1) === 1) r *= b;
    b *= b;
    e >>= 1;
  }
  return r;
}

/** ϑ^(1/q) of the model's ancillary root (q = 1, 2, 3, 4, 6 by roots; otherwise Math.pow once). */
function ancillaryBase(m: FluidModel, theta: number): number {
  const q = m.ancillaryRoot;
  if (q === 1) return theta;
  if (q === 2) return Math.sqrt(theta);
  if (q === 3) return Math.cbrt(theta);
  if (q === 4) return Math.sqrt(Math.sqrt(theta));
  if (q === 6) return Math.cbrt(Math.sqrt(theta));
  return Math.pow(theta, 1 / q);
}

/** ϑ = 1 − T/Tc; Σ n ϑ^t of an ancillary (powers of one root when the model has one). */
function ancillarySum(m: FluidModel, n: Float64Array, t: Float64Array, k: Int32Array, theta: number): number {
  let s = 0;
  if (m.ancillaryRoot === 0) {
    for (let i = 0; i < n.length; i++) s += n[i]! * Math.pow(theta, t[i]!);
    return s;
  }
  const r = ancillaryBase(m, theta);
  for (let i = 0; i < n.length; i++) s += n[i]! * integerPower(r, k[i]!);
  return s;
}

/** Ancillary vapour pressure (Pa) at T < Tc: a starting value. */
export function ancillaryPressure(m: FluidModel, T: number): number {
  return m.pc * Math.exp((m.Tc / T) * ancillarySum(m, m.psN, m.psT, m.psK, 1 - T / m.Tc));
}
/**
 * T (K) at which the ancillary vapour pressure is e^lnp, by Newton's method on
 * ln p = ln p_c + (T_c/T) S(ϑ), S = Σ nϑ^t, d ln p/dT = −(T_c/T²) S − S'(ϑ)/T, S' = Σ n t ϑ^(t−1),
 * kept inside (T_t, T_c); to 1e-9 (a starting value for the saturation solve).
 */
export function ancillaryTemperature(m: FluidModel, lnp: number): number {
  const lt = Math.log(m.pt);
  const lc = Math.log(m.pc);
  // start on the line ln p = a − b/T through the triple and critical points
  let T = 1 / (1 / m.Tt + ((lnp - lt) / (lc - lt)) * (1 / m.Tc - 1 / m.Tt));
  if (!(T > m.Tt * 0.999 && T < m.Tc)) T = 0.5 * (m.Tt + m.Tc);
  const n = m.psN;
  const t = m.psT;
  for (let i = 0; i < 30; i++) {
    const theta = 1 - T / m.Tc;
    let S = 0;
    let dS = 0;
    if (m.ancillaryRoot === 0) {
      for (let j = 0; j < n.length; j++) {
        const x = n[j]! * Math.pow(theta, t[j]!);
        S += x;
        dS += t[j]! * x;
      }
    } else {
      const r = ancillaryBase(m, theta);
      for (let j = 0; j < n.length; j++) {
        const x = n[j]! * integerPower(r, m.psK[j]!);
        S += x;
        dS += t[j]! * x;
      }
    }
    dS /= theta;
    const f = lc + (m.Tc / T) * S - lnp;
    const df = -(m.Tc / (T * T)) * S - dS / T;
    let next = T - f / df;
    if (!(next > m.Tt * 0.999)) next = 0.5 * (T + m.Tt * 0.999);
    if (!(next < m.Tc)) next = 0.5 * (T + m.Tc);
    if (Math.abs(next - T) <= 1e-9 * T) return next;
    T = next;
  }
  return T;
}

/** Ancillary saturated liquid density (kg/m³) at T < Tc. */
export function ancillaryLiquidDensity(m: FluidModel, T: number): number {
  const s = ancillarySum(m, m.rlN, m.rlT, m.rlK, 1 - T / m.Tc);
  return m.rhoc * (m.liquidLogarithmic ? Math.exp(s) : 1 + s);
}
/** Ancillary saturated vapour density (kg/m³) at T < Tc. */
export function ancillaryVaporDensity(m: FluidModel, T: number): number {
  return m.rhoc * Math.exp(ancillarySum(m, m.rvN, m.rvT, m.rvK, 1 - T / m.Tc));
}

/** Pressure (Pa) at (T, ρ), with (∂p/∂ρ)_T into ctx.ar-derived scratch: returns p; `pressureSlope` reads the slope. */
export function pressureAt(ctx: FluidContext, T: number, rho: number): number {
  const m = ctx.model;
  const delta = rho / m.rhor;
  m.residual(delta, m.Tr / T, ctx.ar);
  return rho * m.R * T * (1 + delta * ctx.ar[1]!);
}

/** (∂p/∂ρ)_T at the state of the last {@link pressureAt} call. */
export function pressureSlope(ctx: FluidContext, T: number, rho: number): number {
  const delta = rho / ctx.model.rhor;
  const ar = ctx.ar;
  return ctx.model.R * T * (1 + 2 * delta * ar[1]! + delta * delta * ar[2]!);
}

/**
 * Every property at (T [K], ρ [kg/m³]) from the equation of state, into `out` (phase left as is).
 * @returns `Status.ok`, `Status.invalidInput` for non-positive or non-finite input, or
 *   `Status.undefinedProperty` where cp, cv, w or μ_JT are not finite (exactly at the critical point)
 * @example
 * ```ts
 * const ctx = new FluidContext(fluidModel('water')!), out = new FluidState();
 * propertiesAt(ctx, 500, 838.025, out);   //=> 0 (Status.ok)
 * out.p;    //=> 10000385.80092... (IAPWS-95 Table 7: 0.100003858e2 MPa)
 * out.w;    //=> 1271.28440914... (Table 7: 0.127128441e4 m/s)
 * propertiesAt(ctx, 500, -1, out);        //=> 3 (Status.invalidInput)
 * ```
 */
export function propertiesAt(ctx: FluidContext, T: number, rho: number, out: FluidState): StatusCode {
  if (!(T > 0 && rho > 0 && T < Infinity && rho < Infinity)) return Status.invalidInput;
  const m = ctx.model;
  const delta = rho / m.rhor;
  const tau = m.Tr / T;
  const ar = ctx.ar;
  const a0 = ctx.a0;
  m.residual(delta, tau, ar);
  m.ideal(tau, a0);
  const R = m.R;
  const RT = R * T;
  const arD = ar[1]!;
  const arDD = ar[2]!;
  const tT = tau * (a0[1]! + ar[3]!);
  const tt2 = tau * tau * (a0[2]! + ar[4]!);
  const dD = delta * arD;
  const a = 1 + dD - delta * tau * ar[5]!;
  const b = 1 + 2 * dD + delta * delta * arDD;
  out.T = T;
  out.rho = rho;
  out.v = 1 / rho;
  out.p = rho * RT * (1 + dD);
  out.u = RT * tT;
  out.h = RT * (1 + tT + dD);
  out.s = R * (tT - Math.log(delta) - a0[0]! - ar[0]!);
  out.g = RT * (1 + Math.log(delta) + a0[0]! + ar[0]! + dD);
  out.cv = -R * tt2;
  out.cp = out.cv + (R * a * a) / b;
  out.w = Math.sqrt(RT * (b - (a * a) / tt2));
  out.jouleThomson = -(dD + delta * delta * arDD + delta * tau * ar[5]!) / (a * a - tt2 * b) / (R * rho);
  out.dpdrho = RT * b;
  out.dpdT = rho * R * a;
  out.x = NaN;
  if (!(Number.isFinite(out.cp) && Number.isFinite(out.cv) && Number.isFinite(out.w) && Number.isFinite(out.jouleThomson))) {
    out.cp = NaN;
    out.cv = NaN;
    out.w = NaN;
    out.jouleThomson = NaN;
    return Number.isFinite(out.p) && Number.isFinite(out.h) && Number.isFinite(out.s) ? Status.undefinedProperty : Status.noConvergence;
  }
  return Status.ok;
}
