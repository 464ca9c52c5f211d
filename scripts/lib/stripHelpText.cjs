/* A TypeScript transformer for the functions bundle: leaves out of the worksheet-function specs
 * (functions/families/*.ts, functions/args.ts) the texts that only the generated metadata and the
 * reference read: a function's description, result and help anchor, and each argument's help.
 * functions.json, the declarations and docs/ are generated from the sources, where the texts stay;
 * the bundle never reads them (the adapter reads an argument's name, kind, default, domain and unit).
 * They were about a sixth of the gzipped bundle.
 *
 * What is left out, in those files only:
 * - a property `description`, `help`, `result` or `helpAnchor` of an object literal whose value is
 *   text (a string, a template, or texts joined with +), and a shorthand `help` property;
 * - the text passed to a helper of the same file for a parameter named `help`
 *   (`const volts = (name, help) => …`): the call passes "" there instead.
 * tests/bundle/helpText.test.ts checks that no description or help text of functions.json is in
 * dist/functions.js, and the whole bundle suite runs on the bundle built this way. */
const ts = require('typescript');

const DOC_FIELDS = new Set(['description', 'help', 'result', 'helpAnchor']);

/** True for an expression that is text: a string, a template, or texts joined with +. */
function isText(node) {
  if (ts.isParenthesizedExpression(node)) return isText(node.expression);
  if (ts.isStringLiteral(node) || ts.isNoSubstitutionTemplateLiteral(node) || ts.isTemplateExpression(node)) return true;
  return ts.isBinaryExpression(node) && node.operatorToken.kind === ts.SyntaxKind.PlusToken && isText(node.left) && isText(node.right);
}

/** The name of a property as written (identifier or string key), or null. */
function propertyName(name) {
  if (ts.isIdentifier(name) || ts.isStringLiteral(name)) return name.text;
  return null;
}

/** Position of each file-level helper's `help` parameter: `const f = (…, help, …) => …` or `function f(…, help, …)`. */
function helpParameters(file) {
  const found = new Map();
  const note = (name, params) => {
    const i = params.findIndex((p) => ts.isIdentifier(p.name) && p.name.text === 'help');
    if (i >= 0) found.set(name, i);
  };
  for (const statement of file.statements) {
    if (ts.isFunctionDeclaration(statement) && statement.name) note(statement.name.text, statement.parameters);
    if (!ts.isVariableStatement(statement)) continue;
    for (const d of statement.declarationList.declarations) {
      if (ts.isIdentifier(d.name) && d.initializer && (ts.isArrowFunction(d.initializer) || ts.isFunctionExpression(d.initializer))) note(d.name.text, d.initializer.parameters);
    }
  }
  return found;
}

/** The transformer factory (ts-loader's getCustomTransformers: { before: [stripHelpText] }). */
function stripHelpText(context) {
  const f = context.factory;
  return (file) => {
    const helpers = helpParameters(file);
    const visit = (node) => {
      if (ts.isObjectLiteralExpression(node)) {
        const kept = node.properties.filter((p) => {
          if (ts.isShorthandPropertyAssignment(p)) return p.name.text !== 'help';
          if (!ts.isPropertyAssignment(p)) return true;
          const name = propertyName(p.name);
          return name === null || !DOC_FIELDS.has(name) || !isText(p.initializer);
        });
        const next = kept.length === node.properties.length ? node : f.updateObjectLiteralExpression(node, kept);
        return ts.visitEachChild(next, visit, context);
      }
      if (ts.isCallExpression(node) && ts.isIdentifier(node.expression) && helpers.has(node.expression.text)) {
        const i = helpers.get(node.expression.text);
        const arg = node.arguments[i];
        if (arg !== undefined && isText(arg)) {
          const args = node.arguments.map((a, k) => (k === i ? f.createStringLiteral('') : a));
          return ts.visitEachChild(f.updateCallExpression(node, node.expression, node.typeArguments, args), visit, context);
        }
      }
      return ts.visitEachChild(node, visit, context);
    };
    return ts.visitNode(file, visit);
  };
}

module.exports = { stripHelpText, DOC_FIELDS };
