import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { CHART_DIR, renderPsychrometricCharts } from '../../scripts/generate-psychrometric-chart.js';
import { humidAir } from '../../src/humid-air/index.js';

describe('docs/diagrams/psychrometric-*.svg (generated from the library)', () => {
  const rendered = renderPsychrometricCharts();
  it.each(Object.keys(rendered))('%s is current (npx tsx scripts/generate-psychrometric-chart.ts regenerates it)', (file) => {
    expect(readFileSync(`${CHART_DIR}/${file}`, 'utf8')).toBe(rendered[file]);
  });
  it('the SI chart puts the saturation curve through Ws(30 °C) from the library', () => {
    // plot scale: x 70 … 736 px for −10 … 50 °C, y 464 … 44 px for 0 … 30 g/kg
    const svg = rendered['psychrometric-si.svg']!;
    const sat = /<polyline fill="none" stroke="#1d2a33" stroke-width="2" points="([^"]+)"/.exec(svg)![1]!.split(' ').map((p) => p.split(',').map(Number) as [number, number]);
    const x30 = 70 + ((30 + 10) / 60) * 666;
    const i = sat.findIndex((q) => q[0] >= x30);
    const [a, b] = [sat[i - 1]!, sat[i]!];
    const y = a[1] + ((b[1] - a[1]) * (x30 - a[0])) / (b[0] - a[0]);
    const W = ((464 - y) / 420) * 30;
    // the curve is drawn as straight pieces 0.375 K long, at 0.01 px: within 0.05 g/kg
    expect(Math.abs(W - humidAir.state({ T: '30 °C', RH: 1 }).W.in('g/kg'))).toBeLessThan(0.05);
  });
});
