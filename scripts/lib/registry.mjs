// The adapter's registry of worksheet-function specs (functions/adapter.ts), read from the
// TypeScript sources: for each id, its arguments with kind, unit, default and the accepted
// domain in words. The reference generator uses it beside dist/functions.json.
import { readdirSync } from 'node:fs';
import { register } from 'node:module';
import { resolve } from 'node:path';
import { pathToFileURL } from 'node:url';
import { ROOT } from './bundle.mjs';
import { familiesOf } from './declarations.mjs';

let loaded;
let families;

/** Imports every family module and the adapter's registry (the specs register as they load). */
let hooked = false;
async function importFamilies() {
  if (!hooked) register('./ts-hooks.mjs', import.meta.url);
  hooked = true;
  const dir = resolve(ROOT, 'functions/families');
  const modules = new Map();
  for (const f of readdirSync(dir).filter((x) => x.endsWith('.ts')).sort()) {
    modules.set(f.slice(0, -3), await import(pathToFileURL(resolve(dir, f)).href));
  }
  const { registry } = await import(pathToFileURL(resolve(ROOT, 'functions/adapter.ts')).href);
  return { modules, registry };
}

/** The specs of each family, in declaration order: [{ family, specs }]. */
export async function loadFamilies() {
  if (families) return families;
  const { modules, registry } = await importFamilies();
  families = familiesOf(modules, registry);
  return families;
}

/** Map id → { args: [{ name, kind, unit, default, optional, accepts }], rowResult, usesTable }. */
export async function loadRegistry() {
  if (loaded) return loaded;
  const { registry } = await importFamilies();
  loaded = new Map();
  for (const [id, { spec }] of registry) {
    loaded.set(id, {
      result: spec.result,
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
