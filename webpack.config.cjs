/* Build: dist/functions.js, dist/functions.json (generated from JSDoc), dist/taskpane.html +
 * dist/taskpane.js (one shared runtime: the page loads both bundles), dist/data.js (the reference
 * data both bundles read: the page loads it once, before them; see "The page's scripts" below),
 * dist/manifest.xml, the icons and the function reference (docs/functions.html, the help links' target).
 * CELLWRIGHT_BASE_URL=https://host/path/ builds for that place instead of https://localhost:3000/
 * (scripts/lib/deployBase.cjs). */
const path = require('path');
const HtmlWebpackPlugin = require('html-webpack-plugin');
const CopyWebpackPlugin = require('copy-webpack-plugin');
const CustomFunctionsMetadataPlugin = require('custom-functions-metadata-plugin');
const fs = require('fs');
const { DeployBasePlugin, deployBase } = require('./scripts/lib/deployBase.cjs');
const { stripHelpText } = require('./scripts/lib/stripHelpText.cjs');
const { EagerModulesPlugin } = require('./scripts/lib/eagerModules.cjs');
const { BUILD_SCRIPTS } = require('./scripts/lib/buildInputs.cjs');

// Every file in functions/declarations/ declares one family of worksheet functions.
const declarations = fs
  .readdirSync(path.resolve(__dirname, 'functions/declarations'))
  .filter((f) => f.endsWith('.ts'))
  .sort()
  .map((f) => `./functions/declarations/${f}`);

const BUILD_TIME_MODULE = path.resolve(__dirname, 'src/dataset/buildTime.ts');
const FAMILIES = path.resolve(__dirname, 'functions/families');
const SHARED_ARGS = path.resolve(__dirname, 'functions/args.ts');
const DATA_DIR = path.resolve(__dirname, 'data');

/** True for a module of the reference data: a file of data/ or the values the build computes from it. */
const isReferenceData = (module) => {
  const file = module.resource ?? '';
  return file === BUILD_TIME_MODULE || (path.dirname(file) === DATA_DIR && file.endsWith('.json'));
};

module.exports = (env, argv) => {
  const production = argv.mode !== 'development';
  // Where dist/ will be served from: https://localhost:3000/ unless CELLWRIGHT_BASE_URL says otherwise.
  const base = deployBase(process.env.CELLWRIGHT_BASE_URL);
  return {
    mode: production ? 'production' : 'development',
    devtool: production ? false : 'source-map',
    // Persistent cache (node_modules/.cache/webpack): a second build with unchanged sources, such as the
    // deployable build the tests make after npm test's own, reuses the compiled and minified modules.
    cache: { type: 'filesystem', buildDependencies: { config: [__filename, ...BUILD_SCRIPTS.map((f) => path.resolve(__dirname, f))] } },
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
      // The array data.js puts its modules in; scripts/lib/bundle.mjs names it too.
      chunkLoadingGlobal: 'cellwrightChunks',
      clean: true,
    },
    resolve: { extensions: ['.ts', '.js', '.json'] },
    module: {
      rules: [
        // The worksheet-function specs without the texts only the generated metadata and reference read
        // (scripts/lib/stripHelpText.cjs); functions.json and docs/ are generated from the sources.
        {
          test: /\.ts$/,
          include: [FAMILIES, SHARED_ARGS],
          loader: 'ts-loader',
          options: { transpileOnly: true, instance: 'specs', getCustomTransformers: () => ({ before: [stripHelpText] }) },
        },
        { test: /\.ts$/, loader: 'ts-loader', exclude: [/node_modules/, BUILD_TIME_MODULE, FAMILIES, SHARED_ARGS], options: { transpileOnly: true } },
        // The built-in table checked and the built-in checksums, computed once here instead of at every
        // start (src/dataset/buildTime.ts; BENCHMARKS.md, cold start).
        { test: BUILD_TIME_MODULE, loader: require.resolve('./scripts/lib/buildTimeLoader.cjs'), type: 'javascript/esm' },
      ],
    },
    performance: { hints: false },
    // The page's scripts: the functions and the pane both read the reference data (data/*.json and the
    // values the build computes from it). It is one chunk, dist/data.js, that the page loads once before
    // both bundles (taskpane.html), instead of a copy inside each: functions.js is then under 60 KB
    // gzipped (BENCHMARKS.md, run J). Each bundle waits for that chunk before it runs (webpack's start-up
    // does), so without data.js neither starts; scripts/lib/bundle.mjs evaluates data.js first the same
    // way. The code stays in its bundle, one scope each: only the data moved. Waiting puts each bundle's
    // code in a module function, which EagerModulesPlugin writes so that V8 parses it once, not twice.
    optimization: {
      splitChunks: {
        cacheGroups: {
          default: false,
          defaultVendors: false,
          data: { test: isReferenceData, name: 'data', chunks: 'initial', enforce: true },
        },
      },
    },
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
      ...(production ? [new EagerModulesPlugin(['functions.js', 'taskpane.js'])] : []),
    ],
    devServer: {
      host: 'localhost',
      port: 3000,
      hot: false,
      liveReload: false,
      client: false,
      // no-cache: Excel revalidates the page's scripts, so a rebuild is never run beside a cached older file
      headers: { 'Access-Control-Allow-Origin': '*', 'Cache-Control': 'no-cache' },
      static: [{ directory: path.resolve(__dirname, 'node_modules/@microsoft/office-js/dist'), publicPath: '/office-js' }],
    },
  };
};
