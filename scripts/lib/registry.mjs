// The adapter's registry of worksheet-function specs (functions/adapter.ts), read from the
// TypeScript sources: for each id, its arguments with kind, unit, default and the accepted
// domain in words. The reference generator uses it beside dist/functions.json.
import { readdirSync } from 'node:fs';
import { register } from 'node:module';
import { resolve } from 'node:path';
import { pathToFileURL } from 'node:url';
import { ROOT } from './bundle.mjs';

let loaded;

/** Map id → { args: [{ name, kind, unit, default, optional, accepts }], rowResult, usesTable }. */
export async function loadRegistry() {
  if (loaded) return loaded;
  register('./ts-hooks.mjs', import.meta.url);
  const dir = resolve(ROOT, 'functions/families');
  for (const f of readdirSync(dir).filter((x) => x.endsWith('.ts')).sort()) await import(pathToFileURL(resolve(dir, f)).href);
  const { registry } = await import(pathToFileURL(resolve(ROOT, 'functions/adapter.ts')).href);
  loaded = new Map();
  for (const [id, { spec }] of registry) {
    loaded.set(id, {
      rowResult: spec.rowResult,
      usesTable: Boolean(spec.usesTable),
      args: spec.args.map((a) => ({
        name: a.name,
        kind: a.kind,
        unit: a.unit ?? '',
        optional: Boolean(a.optional) || a.default !== undefined,
        default: a.default,
        accepts: a.domain?.accepts,
      })),
    });
  }
  return loaded;
}
