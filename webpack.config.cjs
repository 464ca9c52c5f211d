/* Build: dist/functions.js (self-contained), dist/functions.json (generated from JSDoc),
 * dist/taskpane.html + dist/taskpane.js (one shared runtime: the page loads both bundles),
 * dist/manifest.xml, the icons and the function reference (docs/functions.html, the help links' target).
 * CELLWRIGHT_BASE_URL=https://host/path/ builds for that place instead of https://localhost:3000/
 * (scripts/lib/deployBase.cjs). */
const path = require('path');
const HtmlWebpackPlugin = require('html-webpack-plugin');
const CopyWebpackPlugin = require('copy-webpack-plugin');
const CustomFunctionsMetadataPlugin = require('custom-functions-metadata-plugin');
const fs = require('fs');
const { DeployBasePlugin, deployBase } = require('./scripts/lib/deployBase.cjs');

// Every file in functions/declarations/ declares one family of worksheet functions.
const declarations = fs
  .readdirSync(path.resolve(__dirname, 'functions/declarations'))
  .filter((f) => f.endsWith('.ts'))
  .sort()
  .map((f) => `./functions/declarations/${f}`);

const BUILD_TIME_MODULE = path.resolve(__dirname, 'src/dataset/buildTime.ts');

module.exports = (env, argv) => {
  const production = argv.mode !== 'development';
  // Where dist/ will be served from: https://localhost:3000/ unless CELLWRIGHT_BASE_URL says otherwise.
  const base = deployBase(process.env.CELLWRIGHT_BASE_URL);
  return {
    mode: production ? 'production' : 'development',
    devtool: production ? false : 'source-map',
    // Persistent cache (node_modules/.cache/webpack): a second build with unchanged sources, such as the
    // deployable build the tests make after npm test's own, reuses the compiled and minified modules.
    cache: { type: 'filesystem', buildDependencies: { config: [__filename, require.resolve('./scripts/lib/deployBase.cjs'), require.resolve('./scripts/lib/buildTimeLoader.cjs'), require.resolve('./scripts/lib/buildTime.mjs')] } },
    target: ['web', 'es2020'],
    entry: {
      // One entry module that imports entry.ts and then every declaration, so that webpack joins the
      // whole bundle into one scope. As separate entries each module stayed a module of its own, and
      // every use of another module's export went through a getter: NERNST over 10^6 cells took
      // 1.6 times as long (BENCHMARKS.md, run F).
      functions: `data:text/javascript,${['./functions/entry.ts', ...declarations].map((f) => `import ${JSON.stringify(f)};`).join('')}`,
      taskpane: './taskpane/main.ts',
    },
    output: {
      path: path.resolve(__dirname, 'dist'),
      filename: '[name].js',
      globalObject: 'globalThis',
      clean: true,
    },
    resolve: { extensions: ['.ts', '.js', '.json'] },
    module: {
      rules: [
        { test: /\.ts$/, loader: 'ts-loader', exclude: [/node_modules/, BUILD_TIME_MODULE], options: { transpileOnly: true } },
        // The built-in table checked and the built-in checksums, computed once here instead of at every
        // start (src/dataset/buildTime.ts; BENCHMARKS.md, cold start).
        { test: BUILD_TIME_MODULE, loader: require.resolve('./scripts/lib/buildTimeLoader.cjs'), type: 'javascript/esm' },
      ],
    },
    performance: { hints: false },
    plugins: [
      new CustomFunctionsMetadataPlugin({ output: 'functions.json', input: declarations }),
      new HtmlWebpackPlugin({
        filename: 'taskpane.html',
        template: './taskpane/taskpane.html',
        chunks: ['functions', 'taskpane'],
        chunksSortMode: 'manual',
        inject: 'body',
        scriptLoading: 'blocking',
      }),
      new CopyWebpackPlugin({
        patterns: [
          { from: 'manifest.xml', to: 'manifest.xml' },
          { from: 'assets/*.png', to: '[name][ext]' },
          { from: 'taskpane/taskpane.css', to: 'taskpane.css' },
          { from: 'docs/functions.html', to: 'docs/functions.html' },
        ],
      }),
      new DeployBasePlugin(base),
    ],
    devServer: {
      host: 'localhost',
      port: 3000,
      hot: false,
      liveReload: false,
      client: false,
      headers: { 'Access-Control-Allow-Origin': '*' },
      static: [{ directory: path.resolve(__dirname, 'node_modules/@microsoft/office-js/dist'), publicPath: '/office-js' }],
    },
  };
};
