/**
 * Nothing in the shipped bundles turns text into code. Every JavaScript file under dist/,
 * and every inline script of every HTML page there, is searched for eval, the Function constructor
 * (with or without `new`) and string arguments to setTimeout/setInterval.
 *
 * The search runs on the built files themselves (npm test builds first), so whatever webpack's
 * runtime adds is covered too: with output.globalObject 'globalThis' and an ES2020 target it adds
 * no `Function("return this")` shim. If a change to the build brings one in, this test names the
 * file and shows the text around it.
 */
import { readFileSync, readdirSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import { describe, expect, it } from 'vitest';
import { DIST } from '../bundle/harness';

/** What turns text into code. Each pattern is tested below against samples, both ways. */
const FORBIDDEN: ReadonlyArray<{ what: string; re: RegExp }> = [
  { what: 'eval', re: /(?<![\w$])eval(?![\w$])/g },
  { what: 'new Function', re: /\bnew\s+Function\s*\(/g },
  { what: 'Function(…) without new', re: /(?<![\w$.])Function\s*\(/g },
  { what: 'Function via a property (globalThis.Function, window.Function, constructor)', re: /\.\s*Function\s*\(|\[\s*["'`]Function["'`]\s*\]|\.constructor\s*\(\s*["'`]/g },
  { what: 'setTimeout/setInterval with a string', re: /\bset(?:Timeout|Interval)\s*\(\s*["'`]/g },
];

function findings(text: string): string[] {
  const out: string[] = [];
  for (const { what, re } of FORBIDDEN) {
    for (const m of text.matchAll(re)) {
      const at = m.index ?? 0;
      out.push(`${what} at ${at}: …${text.slice(Math.max(0, at - 60), at + 60).replace(/\s+/g, ' ')}…`);
    }
  }
  return out;
}

function filesUnder(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const p = join(dir, name);
    return statSync(p).isDirectory() ? filesUnder(p) : [p];
  });
}

describe('no eval or new Function in the shipped bundles', () => {
  it('the detector finds what it must and nothing else', () => {
    for (const bad of ['eval("1")', 'x=eval;', '(0,eval)(s)', 'new Function("return this")', 'Function("a","b")()', 'globalThis.Function("x")', 'g["Function"]("x")', '({}).constructor.constructor("x")', 'setTimeout("x()",1)', 'setInterval(`x`,1)']) {
      expect(findings(bad), bad).not.toEqual([]);
    }
    for (const good of ['evaluate(x)', 'isFunction(x)', 'typeof f === "function"', 'x.evalCount', 'const $eval2 = 1', 'retrieval(x)', 'setTimeout(() => 1, 5)', 'myFunction(1)']) {
      expect(findings(good), good).toEqual([]);
    }
  });

  it('dist/ holds the bundles this test is about', () => {
    const names = readdirSync(DIST);
    expect(names).toContain('data.js');
    expect(names).toContain('functions.js');
    expect(names).toContain('taskpane.js');
  });

  it('no JavaScript file and no inline script under dist/ contains eval, the Function constructor or a string timer', () => {
    const problems: string[] = [];
    let checked = 0;
    for (const file of filesUnder(DIST)) {
      const name = relative(DIST, file);
      if (/\.(m?js|cjs)$/.test(file)) {
        checked++;
        for (const f of findings(readFileSync(file, 'utf8'))) problems.push(`${name}: ${f}`);
      } else if (/\.html?$/.test(file)) {
        checked++;
        const html = readFileSync(file, 'utf8');
        for (const m of html.matchAll(/<script\b[^>]*>([\s\S]*?)<\/script>/gi)) {
          for (const f of findings(m[1])) problems.push(`${name} (inline script): ${f}`);
        }
        // event-handler attributes are inline code too
        for (const m of html.matchAll(/\son[a-z]+\s*=\s*["'][^"']*["']/gi)) problems.push(`${name}: inline event handler ${m[0].trim()}`);
      }
    }
    expect(checked).toBeGreaterThanOrEqual(3);
    expect(problems).toEqual([]);
  });
});

describe('user text reaches the page only as text', () => {
  it('no shipped script parses markup: no innerHTML, outerHTML, insertAdjacentHTML or document.write', () => {
    // the task pane builds every element with createElement/textContent (taskpane/dom.ts); this keeps it so
    const problems: string[] = [];
    for (const file of filesUnder(DIST)) {
      if (!/\.(m?js|cjs)$/.test(file)) continue;
      const text = readFileSync(file, 'utf8');
      for (const m of text.matchAll(/\.(innerHTML|outerHTML)\s*=(?!=)|insertAdjacentHTML\s*\(|document\.write(ln)?\s*\(|createContextualFragment\s*\(/g)) {
        problems.push(`${relative(DIST, file)}: ${m[0]}`);
      }
    }
    expect(problems).toEqual([]);
  });
});
