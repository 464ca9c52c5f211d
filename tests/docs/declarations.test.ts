/**
 * The declarations custom-functions-metadata-plugin reads (functions/declarations/*.ts) are
 * generated from the specs: this fails while the committed files differ from what
 * `npm run declarations` makes now, and checks that the generator names every missing field.
 */
import { spawnSync } from 'node:child_process';
import { resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { renderDeclarations, specProblems } from '../../scripts/lib/declarations.mjs';

const ROOT = resolve(__dirname, '../..');

describe('functions/declarations/*.ts', () => {
  it('are what npm run declarations generates from the specs now (regenerate and commit when this fails)', () => {
    const r = spawnSync(process.execPath, ['scripts/declarations.mjs', '--check'], { cwd: ROOT, encoding: 'utf8' });
    expect(r.stderr + r.stdout, 'run "npm run declarations" and commit functions/declarations/').toMatch(/declarations up to date/);
    expect(r.status).toBe(0);
  }, 60000);

  it('are not generated from a spec that lacks a field, and the message names each one', () => {
    const families = [
      {
        family: 'demo',
        specs: [
          { id: 'ONE', description: 'One.', args: [{ name: 'x' }], helpAnchor: 'one' },
          { id: 'TWO', description: 'Two.', result: 'A number.', helpAnchor: 'two', args: [{ name: 'y', help: 'Y (default 3).', default: 2 }] },
        ],
      },
    ];
    expect(specProblems(families)).toEqual([
      'functions/families/demo.ts: ONE has no result',
      'functions/families/demo.ts: ONE: argument x has no help',
      'functions/families/demo.ts: TWO: the help of y does not say "default 2"',
    ]);
    expect(() => renderDeclarations(families)).toThrow(/complete these specs:[\s\S]*ONE has no result/);
  });

  it('declare optional arguments as optional, in the order of the spec', () => {
    const text = renderDeclarations([
      {
        family: 'demo',
        specs: [
          {
            id: 'ADD',
            description: 'Adds.',
            result: 'A sum.',
            helpAnchor: 'add',
            args: [
              { name: 'a', help: 'First.' },
              { name: 'b', help: 'Second (default 1).', default: 1 },
            ],
          },
        ],
      },
    ]).get('demo')!;
    expect(text).toContain(' * @param a First.\n * @param [b] Second (default 1).\n * @returns A sum.\n');
    expect(text).toContain('function add(a: any[][], b?: any[][]): any[][] {\n  return F.ADD(a, b) as any;\n}');
  });
});
