/**
 * Every doc example (tests/docs/examples-suite.ts: each `@example` under src/ and each ```ts block
 * of the README and the guides) runs against the built package: every name an example takes from an
 * entry (`heatstate`, `heatstate/water`, …) comes from dist/, as a user's import resolves to the
 * published files (names beyond the entries, the SI cores' internals, come from the source tree). A
 * stale comment, a missing export or a difference between the bundled and the source behaviour fails
 * here. Integration project: it waits for the run's one build of dist/ (`HEATSTATE_SKIP_BUILD=1`
 * reuses an existing one while you work).
 */
import { builtDist } from '../helpers/dist.js';

await builtDist();
(globalThis as { heatstateExamplesFromDist?: boolean }).heatstateExamplesFromDist = true;
await import('./examples-suite.js');
