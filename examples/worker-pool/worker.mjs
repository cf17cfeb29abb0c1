// One task of the worker pool: water enthalpy and density for a slice of (p, T) states held in
// shared memory. The worker reads its slice and writes its results in place (waterBatch's `out`),
// so nothing is copied between threads.
import { waterBatch } from 'heatstate/water';

export default function ({ buffers, start, end }) {
  const slice = (buffer, Type) => new Type(buffer, start * Type.BYTES_PER_ELEMENT, end - start);
  const r = waterBatch({ p: slice(buffers.p, Float64Array), T: slice(buffers.T, Float64Array) }, ['h', 'rho'], {
    h: slice(buffers.h, Float64Array),
    rho: slice(buffers.rho, Float64Array),
    status: slice(buffers.status, Uint8Array),
  });
  let bad = 0;
  for (const s of r.status) if (s !== 0 && s !== 4) bad++;
  return bad;
}
