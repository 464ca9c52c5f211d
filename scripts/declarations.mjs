// npm run declarations: writes functions/declarations/<family>.ts from the specs of
// functions/families/<family>.ts (see scripts/lib/declarations.mjs).
//
//   node scripts/declarations.mjs [--check]
//
// --check writes nothing and exits 1 when a committed file differs or is missing, or a file in
// functions/declarations/ has no family.
import { existsSync, readdirSync, readFileSync, unlinkSync, writeFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { ROOT } from './lib/bundle.mjs';
import { renderDeclarations } from './lib/declarations.mjs';
import { loadFamilies } from './lib/registry.mjs';

const check = process.argv.includes('--check');
const dir = resolve(ROOT, 'functions/declarations');
let texts;
try {
  texts = renderDeclarations(await loadFamilies());
} catch (e) {
  console.error(e instanceof Error ? e.message : String(e));
  process.exit(1);
}
const stale = [];
for (const [family, text] of texts) {
  const file = resolve(dir, `${family}.ts`);
  const now = existsSync(file) ? readFileSync(file, 'utf8') : null;
  if (now === text) continue;
  stale.push(`functions/declarations/${family}.ts`);
  if (!check) writeFileSync(file, text);
}
for (const f of readdirSync(dir).filter((x) => x.endsWith('.ts'))) {
  if (texts.has(f.slice(0, -3))) continue;
  stale.push(`functions/declarations/${f} (no family)`);
  if (!check) unlinkSync(resolve(dir, f));
}
if (check && stale.length) {
  console.error(`stale declarations (run npm run declarations):\n  ${stale.join('\n  ')}`);
  process.exit(1);
}
console.log(stale.length ? `wrote ${stale.join(', ')}` : 'declarations up to date');
