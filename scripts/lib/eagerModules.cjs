/* webpack plugin for the production build: writes each module of the given bundles as a
 * parenthesised function expression, `998:(function(e,t,n){…})`, instead of the method
 * `998(e,t,n){…}` webpack writes.
 *
 * Why: a bundle whose start waits for another chunk (functions.js and taskpane.js wait for data.js)
 * keeps its code in a module function, no longer at the top of its IIFE. V8 compiles such a function
 * lazily: it pre-parses the whole body while compiling the script, then parses it again when the
 * function is called, at start, since every module of these bundles runs at start. A function
 * expression in parentheses is compiled at once (V8's heuristic for immediately invoked functions),
 * so the body is parsed once, as it was before the data moved out. Measured on functions.js:
 * BENCHMARKS.md, run J.
 *
 * Applied after minification to the modules object that starts each bundle's IIFE; the build fails
 * when that object is not found, rather than ship the slower form unnoticed.
 * tests/bundle/eagerModules.test.ts checks the rewriting and the built bundles. */
const acorn = require('acorn');
const { Compilation, sources } = require('webpack');

const NAME = 'EagerModulesPlugin';

/**
 * The modules object of a webpack bundle: `(()=>{var e={…};…})()`, the first variable of the IIFE
 * whose value is an object of functions. Returns the ObjectExpression node or null.
 */
function modulesObject(ast) {
  const first = ast.body[0];
  if (!first || first.type !== 'ExpressionStatement') return null;
  let call = first.expression;
  if (call.type === 'UnaryExpression') call = call.argument; // !function(){…}()
  if (call.type !== 'CallExpression') return null;
  const fn = call.callee;
  if (fn.type !== 'ArrowFunctionExpression' && fn.type !== 'FunctionExpression') return null;
  if (fn.body.type !== 'BlockStatement') return null;
  for (const statement of fn.body.body) {
    if (statement.type !== 'VariableDeclaration') continue;
    for (const d of statement.declarations) {
      const init = d.init;
      if (init && init.type === 'ObjectExpression' && init.properties.length > 0 && init.properties.every((p) => p.type === 'Property' && (p.value.type === 'FunctionExpression' || p.value.type === 'ArrowFunctionExpression'))) {
        return init;
      }
    }
    return null;
  }
  return null;
}

/**
 * `src` with every module of its modules object written as a parenthesised function expression.
 * Throws when the bundle has no modules object.
 */
function eagerModules(src, file = 'the bundle') {
  const ast = acorn.parse(src, { ecmaVersion: 'latest', sourceType: 'script' });
  const modules = modulesObject(ast);
  if (modules === null) throw new Error(`${NAME}: no modules object at the start of ${file}`);
  let out = '';
  let at = 0;
  for (const p of modules.properties) {
    const fn = p.value;
    if (fn.type !== 'FunctionExpression' || (src[p.value.start - 1] === '(' && !p.method)) continue; // already an expression in parentheses
    const key = src.slice(p.key.start, p.key.end);
    const keyText = p.computed ? `[${key}]` : key;
    // a method's FunctionExpression starts at its parameters; a `key:function(…){…}` one at `function`
    const body = p.method ? `function${src.slice(fn.start, fn.end)}` : src.slice(fn.start, fn.end);
    out += `${src.slice(at, p.start)}${keyText}:(${body})`;
    at = p.end;
  }
  return out + src.slice(at);
}

class EagerModulesPlugin {
  /** @param {readonly string[]} files the bundles to rewrite, e.g. ['functions.js', 'taskpane.js'] */
  constructor(files) {
    this.files = files;
  }

  apply(compiler) {
    compiler.hooks.thisCompilation.tap(NAME, (compilation) => {
      compilation.hooks.processAssets.tap({ name: NAME, stage: Compilation.PROCESS_ASSETS_STAGE_OPTIMIZE_SIZE + 1 }, () => {
        for (const file of this.files) {
          const asset = compilation.getAsset(file);
          if (!asset) continue;
          compilation.updateAsset(file, new sources.RawSource(eagerModules(asset.source.source().toString(), file)));
        }
      });
    });
  }
}

module.exports = { EagerModulesPlugin, eagerModules };
