/**
 * The production build writes each module of functions.js and taskpane.js as a parenthesised function
 * expression (scripts/lib/eagerModules.cjs), so that V8 compiles the module functions, which all run at
 * start, once instead of pre-parsing them and parsing them again when called (BENCHMARKS.md, run J).
 */
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { resolve } from 'node:path';
import vm from 'node:vm';
import { describe, expect, it } from 'vitest';
import { DIST } from './harness';

const require = createRequire(import.meta.url);
const { eagerModules } = require('../../scripts/lib/eagerModules.cjs') as { eagerModules: (src: string, file?: string) => string };

/** The modules of a bundle's modules object, as written: `12:(function(e,t,n){…})` or `12(e,t,n){…}`. */
const written = (src: string): { parenthesised: number; methods: number } => ({
  parenthesised: (src.match(/[{,]\d+:\(function\(/g) ?? []).length,
  methods: (src.match(/[{,]\d+\([a-z,]*\)\{/g) ?? []).length,
});

describe('EagerModulesPlugin', () => {
  it('rewrites every module of the modules object and nothing else, with the same behaviour', () => {
    const src = '(()=>{var e={12(e,t,n){t.x=function(a){return a+1}},7:function(e,t){t.y={m(q){return q}}.m(2)},"a b"(e,t){t.z=3}};const t={};function n(o){const r=t[o];if(r)return r.exports;const i=t[o]={exports:{}};return e[o](i,i.exports,n),i.exports}globalThis.out=[n(12).x(1),n(7).y,n("a b").z]})();';
    const out = eagerModules(src);
    expect(out).toBe('(()=>{var e={12:(function(e,t,n){t.x=function(a){return a+1}}),7:(function(e,t){t.y={m(q){return q}}.m(2)}),"a b":(function(e,t){t.z=3})};const t={};function n(o){const r=t[o];if(r)return r.exports;const i=t[o]={exports:{}};return e[o](i,i.exports,n),i.exports}globalThis.out=[n(12).x(1),n(7).y,n("a b").z]})();');
    const before = vm.runInNewContext(`${src}out`) as unknown[];
    const after = vm.runInNewContext(`${out}out`) as unknown[];
    expect([...after]).toEqual([...before]);
    expect([...after]).toEqual([2, 2, 3]);
    expect(eagerModules(out)).toBe(out); // already written so: unchanged
  });
  it('fails the build when a bundle has no modules object', () => {
    expect(() => eagerModules('(()=>{console.log(1)})();', 'x.js')).toThrow(/no modules object at the start of x\.js/);
  });
  it('the built functions.js and taskpane.js have every module parenthesised', () => {
    for (const f of ['functions.js', 'taskpane.js']) {
      const w = written(readFileSync(resolve(DIST, f), 'utf8'));
      expect(w.parenthesised, f).toBeGreaterThan(0);
      expect(w.methods, f).toBe(0);
    }
  });
});
