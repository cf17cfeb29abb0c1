/**
 * The doc examples of tests/docs/examples.test.ts run against the built package: every name an
 * example takes from an entry (`heatstate`, `heatstate/water`, …) comes from dist/, as a user's import
 * resolves to the published files (names beyond the entries, the SI cores' internals, still come
 * from the source tree). A stale build, a missing export or a difference between the bundled and the
 * source behaviour fails here. Integration project: it waits for the run's one build of dist/.
 */
import { builtDist } from '../helpers/dist.js';

await builtDist();
(globalThis as { heatstateExamplesFromDist?: boolean }).heatstateExamplesFromDist = true;
await import('./examples.test.js');
