/**
 * Setup file of the `unit` project (vitest.config.ts): its worker processes run at a lower
 * scheduling priority (nice 10). In `npm test` the unit files are the work that can wait: the build
 * of dist/ and the typedoc run are long single chains that other integration files wait for, while
 * the unit files fill whatever CPU is left. Alone (`npm run test:unit`) it changes nothing on an idle
 * machine. It changes no result.
 */
import { getPriority, setPriority } from 'node:os';

const NICE = 10;
try {
  if (getPriority() < NICE) setPriority(NICE);
} catch {
  // not permitted here: run at normal priority
}
