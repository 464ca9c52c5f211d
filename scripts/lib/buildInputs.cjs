/* The build's own scripts besides webpack.config.cjs: a change to any of them makes a build stale.
 * Read by webpack.config.cjs (the persistent cache's build dependencies) and by scripts/lib/bundle.mjs
 * (whether dist/ must be rebuilt before the bundle is loaded), so the two never disagree. */
module.exports = {
  BUILD_SCRIPTS: ['scripts/lib/buildInputs.cjs', 'scripts/lib/deployBase.cjs', 'scripts/lib/buildTimeLoader.cjs', 'scripts/lib/buildTime.mjs', 'scripts/lib/stripHelpText.cjs', 'scripts/lib/eagerModules.cjs'],
};
