/* Where the built add-in is served from, and the webpack plugin that writes dist/ for that place.
 *
 * Without CELLWRIGHT_BASE_URL the build is the development build: every URL is https://localhost:3000/
 * (npm start serves it) and the page loads office.js from the local copy at office-js/office.js.
 *
 * With CELLWRIGHT_BASE_URL=https://host/path/ every URL in dist/ is written under that base (the
 * manifest's URLs: page, functions script and metadata, SupportUrl, icons, help; and the @helpurl of
 * every function in functions.json), and the page loads office.js from the Office JavaScript API CDN,
 * the location published add-ins must use, with the page's Content-Security-Policy allowing scripts
 * from exactly that origin besides its own. The build fails when anything still points at localhost. */
const { Compilation, WebpackError, sources } = require('webpack');

const DEV_BASE = 'https://localhost:3000/';
/** The CDN location of office.js for published add-ins (learn.microsoft.com, "Referencing the Office
 * JavaScript API library"). */
const OFFICE_JS_CDN = 'https://appsforoffice.microsoft.com/lib/1/hosted/office.js';
/** The page's reference to the local copy (html-webpack-plugin's minifier drops the quotes). */
const LOCAL_OFFICE_JS = /<script src="?office-js\/office\.js"?><\/script>/;
const CSP_SCRIPT_SRC = "script-src 'self';";

/** The base URL to build for (ending in "/"), or DEV_BASE when `value` is unset or empty. Throws on a
 * value Office cannot use: every add-in URL must be absolute https. */
function deployBase(value) {
  if (value === undefined || value.trim() === '') return DEV_BASE;
  let url;
  try {
    url = new URL(value.trim());
  } catch {
    throw new Error(`CELLWRIGHT_BASE_URL must be an absolute https URL such as https://example.org/cellwright/ (got "${value}")`);
  }
  if (url.protocol !== 'https:') throw new Error(`CELLWRIGHT_BASE_URL must use https (Office loads add-ins over https only; got "${value}")`);
  if (url.search !== '' || url.hash !== '') throw new Error(`CELLWRIGHT_BASE_URL must not have a query or fragment (got "${value}")`);
  const href = url.href;
  return href.endsWith('/') ? href : `${href}/`;
}

function replaceAll(text, from, to, what) {
  if (typeof from === 'string') {
    if (!text.includes(from)) throw new Error(`${what}: expected to find ${JSON.stringify(from)}`);
    return text.split(from).join(to);
  }
  if (!from.test(text)) throw new Error(`${what}: expected to find ${from}`);
  return text.replace(new RegExp(from.source, 'g'), to);
}

/** Rewrites the emitted manifest, functions.json and taskpane.html for `base` (a no-op for DEV_BASE). */
class DeployBasePlugin {
  constructor(base) {
    this.base = base;
  }
  apply(compiler) {
    if (this.base === DEV_BASE) return;
    const base = this.base;
    compiler.hooks.thisCompilation.tap('DeployBasePlugin', (compilation) => {
      compilation.hooks.processAssets.tap({ name: 'DeployBasePlugin', stage: Compilation.PROCESS_ASSETS_STAGE_SUMMARIZE }, (assets) => {
        const edit = (name, change) => {
          if (!(name in assets)) {
            compilation.errors.push(new WebpackError(`DeployBasePlugin: ${name} was not emitted`));
            return;
          }
          try {
            compilation.updateAsset(name, new sources.RawSource(change(assets[name].source().toString())));
          } catch (e) {
            compilation.errors.push(new WebpackError(`DeployBasePlugin: ${e.message}`));
          }
        };
        edit('manifest.xml', (xml) =>
          replaceAll(xml, DEV_BASE, base, 'manifest.xml')
            // The source's comments describe the development build; say what this one is instead.
            .replace(/<!--[\s\S]*?-->\s*/g, '')
            .replace(/^(<\?xml[^>]*\?>\s*)/, `$1<!-- Cellwright add-in manifest for ${base.replace(/--/g, '-&#45;')} (built with CELLWRIGHT_BASE_URL). -->\n`),
        );
        edit('functions.json', (json) => replaceAll(json, DEV_BASE, base, 'functions.json'));
        edit('taskpane.html', (html) =>
          replaceAll(
            replaceAll(html, LOCAL_OFFICE_JS, `<script src="${OFFICE_JS_CDN}"></script>`, 'taskpane.html'),
            CSP_SCRIPT_SRC,
            `script-src 'self' ${new URL(OFFICE_JS_CDN).origin};`,
            'taskpane.html',
          ),
        );
        for (const [name, source] of Object.entries(assets)) {
          if (!/\.(xml|json|html|js|css|md)$/.test(name)) continue;
          if (/localhost/.test(source.source().toString())) {
            compilation.errors.push(new WebpackError(`DeployBasePlugin: ${name} still mentions localhost in a build for ${base}`));
          }
        }
      });
    });
  }
}

module.exports = { DEV_BASE, OFFICE_JS_CDN, deployBase, DeployBasePlugin };
