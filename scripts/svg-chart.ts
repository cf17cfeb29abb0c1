/**
 * heatstate's house style for generated SVG diagrams: one chart function (axes, grid, labelled
 * series, a source note), shared by every diagram script so they look alike.
 *
 * @module
 */
export type Point = [number, number];
export interface Series {
  readonly points: Point[][];
  readonly label: string;
  readonly color: string;
  readonly width?: number;
  readonly dash?: string;
  /** Where to put the label: the index of the run and the point. */
  readonly labelAt?: [number, number];
}
export interface Axis {
  readonly label: string;
  readonly min: number;
  readonly max: number;
  readonly log?: boolean;
  readonly ticks: number[];
  readonly format?: (v: number) => string;
}

const W = 720;
const H = 480;
const M = { left: 70, right: 20, top: 40, bottom: 56 };
const n = (x: number) => (Math.round(x * 100) / 100).toString();
const esc = (s: string) => s.replace(/&/g, '&amp;').replace(/</g, '&lt;');

export function chart(title: string, x: Axis, y: Axis, series: Series[], note: string): string {
  const sx = (v: number) => M.left + ((x.log ? Math.log10(v) - Math.log10(x.min) : v - x.min) / (x.log ? Math.log10(x.max) - Math.log10(x.min) : x.max - x.min)) * (W - M.left - M.right);
  const sy = (v: number) => H - M.bottom - ((y.log ? Math.log10(v) - Math.log10(y.min) : v - y.min) / (y.log ? Math.log10(y.max) - Math.log10(y.min) : y.max - y.min)) * (H - M.top - M.bottom);
  const inside = ([a, b]: Point) => a >= x.min && a <= x.max && b >= y.min && b <= y.max;
  const out: string[] = [];
  out.push(`<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${W} ${H}" width="${W}" height="${H}" font-family="system-ui, sans-serif" font-size="12">`);
  out.push(`<rect width="${W}" height="${H}" fill="#ffffff"/>`);
  out.push(`<text x="${W / 2}" y="22" text-anchor="middle" font-size="15" font-weight="600">${esc(title)}</text>`);
  for (const t of x.ticks) {
    const px = n(sx(t));
    out.push(`<line x1="${px}" y1="${M.top}" x2="${px}" y2="${H - M.bottom}" stroke="#e5e9ec"/>`);
    out.push(`<text x="${px}" y="${H - M.bottom + 16}" text-anchor="middle">${esc((x.format ?? String)(t))}</text>`);
  }
  for (const t of y.ticks) {
    const py = n(sy(t));
    out.push(`<line x1="${M.left}" y1="${py}" x2="${W - M.right}" y2="${py}" stroke="#e5e9ec"/>`);
    out.push(`<text x="${M.left - 6}" y="${py}" text-anchor="end" dominant-baseline="middle">${esc((y.format ?? String)(t))}</text>`);
  }
  out.push(`<rect x="${M.left}" y="${M.top}" width="${W - M.left - M.right}" height="${H - M.top - M.bottom}" fill="none" stroke="#5b6b76"/>`);
  out.push(`<text x="${(M.left + W - M.right) / 2}" y="${H - 14}" text-anchor="middle">${esc(x.label)}</text>`);
  out.push(`<text transform="translate(16 ${(M.top + H - M.bottom) / 2}) rotate(-90)" text-anchor="middle">${esc(y.label)}</text>`);
  for (const s of series) {
    for (const run of s.points) {
      const pts = run.filter(inside).map(([a, b]) => `${n(sx(a))},${n(sy(b))}`);
      if (pts.length < 2) continue;
      out.push(`<polyline fill="none" stroke="${s.color}" stroke-width="${s.width ?? 1.4}"${s.dash ? ` stroke-dasharray="${s.dash}"` : ''} points="${pts.join(' ')}"/>`);
    }
    const [ri, pi] = s.labelAt ?? [0, Math.floor((s.points[0]?.length ?? 1) / 2)];
    const at = s.points[ri]?.[pi];
    if (at && inside(at)) out.push(`<text x="${n(sx(at[0]) + 4)}" y="${n(sy(at[1]) - 4)}" fill="${s.color}">${esc(s.label)}</text>`);
  }
  out.push(`<text x="${W - M.right}" y="${M.top - 8}" text-anchor="end" fill="#5b6b76" font-size="10">${esc(note)}</text>`);
  out.push('</svg>');
  return `${out.join('\n')}\n`;
}
