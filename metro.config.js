// Keeps Metro out of the database and build folders.
const { getDefaultConfig } = require('expo/metro-config');
const path = require('path');

const config = getDefaultConfig(__dirname);
const escape = (p) => path.resolve(__dirname, p).replace(/[/\\]/g, '[/\\\\]');
config.resolver.blockList = [
  new RegExp(`${escape('.data')}[/\\\\].*`),
  new RegExp(`${escape('dist-server')}[/\\\\].*`),
];

// zod re-exports every translation it ships as `z.locales`; Metro cannot drop unused
// exports, so the web bundle would carry all of them. Specbench never calls z.locales,
// so zod's own `../locales/index.js` resolves to English alone (see the file).
const ZOD_INTERNALS = /[/\\]node_modules[/\\]zod[/\\]v4[/\\](classic|core)[/\\]/;
const defaultResolve = config.resolver.resolveRequest;
config.resolver.resolveRequest = (context, moduleName, platform) => {
  if (moduleName === '../locales/index.js' && ZOD_INTERNALS.test(context.originModulePath)) {
    return { type: 'sourceFile', filePath: path.join(__dirname, 'scripts', 'metro', 'zod-locales-en.js') };
  }
  return (defaultResolve ?? context.resolveRequest)(context, moduleName, platform);
};

module.exports = config;
