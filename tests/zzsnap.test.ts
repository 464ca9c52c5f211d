import { createHash } from 'node:crypto';
import { writeFileSync } from 'node:fs';
import fc from 'fast-check';
import { it } from 'vitest';
import { loadBundle } from './bundle/harness';
import { argumentsFor, settle } from './robustness/support';

function ser(v: unknown): string {
  if (Array.isArray(v)) return `[${v.map(ser).join(',')}]`;
  if (typeof v === 'number') return Object.is(v, -0) ? '-0' : String(v);
  if (v !== null && typeof v === 'object' && 'code' in v) return `E(${String((v as any).code)}|${String((v as any).message)})`;
  return JSON.stringify(v) ?? 'undefined';
}
it('snapshot', async () => {
  const b = loadBundle();
  const lines: string[] = [];
  for (const meta of b.metadata.functions) {
    const samples = fc.sample(argumentsFor(meta), { numRuns: 400, seed: 12345 });
    for (const args of samples) {
      const s = await settle(() => b.call(meta.id, ...args));
      lines.push(`${meta.id} ${s.ok ? ser(s.value) : 'FAIL ' + s.problem}`);
    }
  }
  const text = lines.join('\n');
  writeFileSync(process.env.SNAP_OUT ?? '/tmp/i13/snap.txt', text);
  console.log('snapshot', lines.length, createHash('sha256').update(text).digest('hex'));
}, 600000);
