/**
 * Validation with zod's tree-shakable "mini" build. Schemas import `zod/mini` directly (so a
 * bundle keeps only what they use); every run-time check goes through {@link safeParse}, which
 * switches zod to its English messages once, on first use.
 *
 * @module
 */
import { config } from 'zod/mini';
import en from 'zod/v4/locales/en.js';

let configured = false;

/** `schema.safeParse(data)`, with English messages. */
export function safeParse<R>(schema: { safeParse(data: unknown): R }, data: unknown): R {
  if (!configured) {
    config(en());
    configured = true;
  }
  return schema.safeParse(data);
}

/**
 * A schema built on first use: `lazySchema(() => z.strictObject(...))` returns a function that builds
 * the schema the first time it is called and returns the same one after, so importing a module that
 * validates costs no zod work until something is validated.
 */
export function lazySchema<S>(build: () => S): () => S {
  let schema: S | undefined;
  return () => (schema ??= build());
}
