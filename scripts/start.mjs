// npm start: build, make localhost certificates (no system-store install unless asked with
// --install-ca), serve dist/ over https on localhost:3000 with office.js from the installed
// @microsoft/office-js package, and print how to sideload the manifest into Excel.
import { createRequire } from 'node:module';
import { existsSync, mkdirSync, readFileSync } from 'node:fs';
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
await server.start();

const manifest = resolve(root, 'manifest.xml');
console.log(`
Cellwright is served at https://localhost:3000 (bound to localhost only).

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
