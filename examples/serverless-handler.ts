/**
 * A serverless HTTP handler with the standard Request/Response signature (the shape most serverless
 * platforms accept): GET /?p=10%20MPa&T=500%20°C&units=us returns the water state as JSON. Any two
 * of T, p, h, s, x, v, rho may be given. Bad input is answered with HTTP 400 and a clear message.
 */
import { HeatstateError, water, type WaterPair } from 'heatstate';

const OUTPUT_UNITS = {
  si: { T: 'K', p: 'kPa', v: 'm³/kg', rho: 'kg/m³', u: 'kJ/kg', h: 'kJ/kg', s: 'kJ/(kg·K)', cp: 'kJ/(kg·K)', cv: 'kJ/(kg·K)', w: 'm/s' },
  us: { T: '°F', p: 'psia', v: 'ft³/lbm', rho: 'lbm/ft³', u: 'Btu/lbm', h: 'Btu/lbm', s: 'Btu/(lbm·°R)', cp: 'Btu/(lbm·°R)', cv: 'Btu/(lbm·°R)', w: 'ft/s' },
} as const;
const INPUTS = ['T', 'p', 'h', 's', 'x', 'v', 'rho'] as const;

const json = (status: number, body: unknown) => new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json; charset=utf-8' } });

export default async function handler(request: Request): Promise<Response> {
  if (request.method !== 'GET') return json(405, { error: 'use GET with query parameters, for example ?p=10 MPa&T=500 °C' });
  const query = new URL(request.url).searchParams;
  const units = query.get('units') ?? 'si';
  if (units !== 'si' && units !== 'us') return json(400, { error: `units must be si or us; got ${units}` });
  const pair: Record<string, string | number> = {};
  for (const key of INPUTS) {
    const value = query.get(key);
    if (value === null) continue;
    if (key === 'x') {
      const x = Number(value);
      if (value.trim() === '' || !Number.isFinite(x)) return json(400, { error: `x must be a number between 0 and 1; got "${value}"` });
      pair.x = x;
    } else pair[key] = value;
  }
  if (Object.keys(pair).length !== 2) return json(400, { error: `give exactly two of ${INPUTS.join(', ')}, for example ?p=10 MPa&T=500 °C; got ${Object.keys(pair).length}` });
  try {
    const st = water.state(pair as WaterPair);
    const out: Record<string, unknown> = { phase: st.phase, region: st.region, x: st.x ?? null };
    for (const [name, unit] of Object.entries(OUTPUT_UNITS[units])) {
      const q = st[name as keyof typeof OUTPUT_UNITS.si];
      out[name] = q === undefined ? null : { value: q.in(unit), unit };
    }
    return json(200, out);
  } catch (e) {
    if (e instanceof HeatstateError) return json(400, { error: e.message, code: e.code });
    return json(500, { error: 'internal error' });
  }
}
