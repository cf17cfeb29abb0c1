import { describe, expect, it } from 'vitest';
import handler from '../examples/serverless-handler.js';
import { water } from '../src/water/index.js';

const get = (query: string) => handler(new Request(`https://example.invalid/?${query}`));

describe('examples/serverless-handler.ts (standard Request/Response)', () => {
  it('answers a water state from query parameters, in SI or US units', async () => {
    const res = await get(`p=${encodeURIComponent('10 MPa')}&T=${encodeURIComponent('500 °C')}`);
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toContain('application/json');
    const body = (await res.json()) as { phase: string; h: { value: number; unit: string } };
    expect(body.phase).toBe('vapor');
    expect(body.h).toEqual({ value: water.state({ p: '10 MPa', T: '500 °C' }).h.in('kJ/kg'), unit: 'kJ/kg' });
    const us = (await (await get(`p=${encodeURIComponent('150 psig')}&x=0.9&units=us`)).json()) as { T: { unit: string }; cp: unknown };
    expect(us.T.unit).toBe('°F');
    expect(us.cp).toBeNull();
  });
  it.each([
    ['a missing second property', `p=${encodeURIComponent('1 MPa')}`, /give exactly two/],
    ['an unknown unit', `p=${encodeURIComponent('1 MPa')}&T=${encodeURIComponent('300 furlongs')}`, /unknown unit/],
    ['a state outside IF97', `p=${encodeURIComponent('1 MPa')}&T=${encodeURIComponent('3000 K')}`, /above the upper limit of IAPWS-IF97 region 5/],
    ['a bad quality', `p=${encodeURIComponent('1 MPa')}&x=abc`, /x must be a number/],
    ['bad units', `p=${encodeURIComponent('1 MPa')}&T=${encodeURIComponent('300 K')}&units=imperial`, /units must be si or us/],
  ])('answers %s with HTTP 400 and a clear message', async (_what, query, message) => {
    const res = await get(query);
    expect(res.status).toBe(400);
    const body = (await res.json()) as { error: string };
    expect(body.error).toMatch(message);
  });
  it('refuses other methods', async () => {
    expect((await handler(new Request('https://example.invalid/', { method: 'POST' }))).status).toBe(405);
  });
});
