// npm start: build, make localhost certificates (no system-store install unless asked with
// --install-ca), serve dist/ over https on localhost:3000 with office.js from the installed
// @microsoft/office-js package, and print how to sideload the manifest into Excel. "Ready" and the
// sideload steps are printed only once webpack's first build has succeeded and the server has
// answered a request for the manifest.
import { createRequire } from 'node:module';
import { existsSync, mkdirSync, readFileSync } from 'node:fs';
import { get } from 'node:https';
import { resolve, dirname } from 'node:path';
import { fileURLToPath } from 'node:url';

const require = createRequire(import.meta.url);
const root = resolve(dirname(fileURLToPath(import.meta.url)), '..');
const webpack = require('webpack');
const WebpackDevServer = require('webpack-dev-server');
const devCerts = require('office-addin-dev-certs');

const certDir = resolve(root, '.certs');
const ca = resolve(certDir, 'ca.crt');
const cert = resolve(certDir, 'localhost.crt');
const key = resolve(certDir, 'localhost.key');

if (!existsSync(cert) || !existsSync(key)) {
  mkdirSync(certDir, { recursive: true });
  console.log('Making localhost certificates in .certs/ (nothing is installed in the system store) …');
  await devCerts.generateCertificates(ca, cert, key, 30, ['127.0.0.1', 'localhost']);
}
if (process.argv.includes('--install-ca')) {
  console.log('Installing the development CA in the system store (you asked with --install-ca) …');
  await devCerts.installCaCertificate(ca);
}

const config = require(resolve(root, 'webpack.config.cjs'))({}, { mode: 'production' });
const compiler = webpack(config);
const devServerOptions = {
  ...config.devServer,
  server: { type: 'https', options: { ca: readFileSync(ca), cert: readFileSync(cert), key: readFileSync(key) } },
  static: [
    ...config.devServer.static,
    ...(existsSync(resolve(root, 'docs')) ? [{ directory: resolve(root, 'docs'), publicPath: '/docs' }] : []),
  ],
};
const server = new WebpackDevServer(devServerOptions, compiler);

// Resolves after the first build without errors (a failed build is reported and the next one awaited:
// the server keeps watching the sources).
const built = new Promise((resolveBuilt) => {
  let done = false;
  compiler.hooks.done.tap('cellwright-start', (stats) => {
    if (done) return;
    if (stats.hasErrors()) {
      console.error(stats.toString({ all: false, errors: true, colors: false }));
      console.error('\nThe build failed; fix the errors above (the server rebuilds on every change).');
      return;
    }
    done = true;
    resolveBuilt();
  });
});

/** Asks the server for a file, trusting the development CA; resolves with the status code. */
function probe(path) {
  return new Promise((resolveProbe, reject) => {
    const req = get({ host: 'localhost', port: devServerOptions.port, path, ca: readFileSync(ca) }, (res) => {
      res.resume();
      resolveProbe(res.statusCode);
    });
    req.on('error', reject);
    req.setTimeout(10_000, () => req.destroy(new Error('no answer within 10 s')));
  });
}

console.log('Building and starting the server on https://localhost:3000 …');
await server.start();
await built;
const status = await probe('/manifest.xml');
if (status !== 200) {
  console.error(`The server answered ${status} for /manifest.xml; it is not ready. Stop it with Ctrl+C.`);
  process.exitCode = 1;
  await server.stop();
  process.exit();
}

const manifest = resolve(root, 'manifest.xml');
console.log(`
Cellwright is ready at https://localhost:3000 (bound to localhost only).

Manifest: ${manifest}

Sideload it into Excel:
  Excel on the web  – open a workbook, Home › Add-ins › More Add-ins › My Add-ins ›
                      Upload My Add-in, choose the manifest above.
  Excel on Windows  – share a folder that holds manifest.xml, add it under File › Options ›
                      Trust Center › Trust Center Settings › Trusted Add-in Catalogs
                      (tick "Show in Menu"), restart Excel, then Home › Add-ins › Shared Folder.
  Excel on macOS    – copy manifest.xml to
                      ~/Library/Containers/com.microsoft.Excel/Data/Documents/wef/ and restart Excel.

The browser or Excel must trust the development CA: ${ca}
(run "npm start -- --install-ca" to install it in the system store, or import it by hand).
Then type =CELLWRIGHT. in a cell. Stop the server with Ctrl+C.
`);
