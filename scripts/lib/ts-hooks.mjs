// Module hooks that let the plain-node scripts import the project's TypeScript sources (for
// the reference generator, which reads each argument's unit, default and accepted range from
// the adapter's registry). Extensionless relative imports resolve to .ts files; .ts is
// transpiled with the installed TypeScript (types erased, nothing checked); .json loads as a
// default export. Registered by scripts/lib/registry.mjs with module.register().
import { existsSync, readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { createRequire } from 'node:module';

const require = createRequire(import.meta.url);
let ts;

export async function resolve(specifier, context, next) {
  if ((specifier.startsWith('./') || specifier.startsWith('../')) && context.parentURL?.endsWith('.ts')) {
    for (const suffix of ['.ts', '/index.ts']) {
      const url = new URL(specifier + suffix, context.parentURL);
      if (!/\.[a-z]+$/i.test(specifier) && existsSync(fileURLToPath(url))) return { url: url.href, shortCircuit: true };
    }
  }
  return next(specifier, context);
}

export async function load(url, context, next) {
  if (url.endsWith('.ts')) {
    ts ??= require('typescript');
    const source = readFileSync(fileURLToPath(url), 'utf8');
    const out = ts.transpileModule(source, {
      fileName: fileURLToPath(url),
      compilerOptions: { module: ts.ModuleKind.ESNext, target: ts.ScriptTarget.ES2020, verbatimModuleSyntax: false, isolatedModules: true },
    });
    return { format: 'module', source: out.outputText, shortCircuit: true };
  }
  if (url.endsWith('.json') && url.startsWith('file:')) {
    return { format: 'module', source: `export default ${readFileSync(fileURLToPath(url), 'utf8')};`, shortCircuit: true };
  }
  return next(url, context);
}
