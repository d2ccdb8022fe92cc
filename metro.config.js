// Keeps Metro out of the database and build folders.
const { getDefaultConfig } = require('expo/metro-config');
const path = require('path');

const config = getDefaultConfig(__dirname);
const escape = (p) => path.resolve(__dirname, p).replace(/[/\\]/g, '[/\\\\]');
config.resolver.blockList = [
  new RegExp(`${escape('.data')}[/\\\\].*`),
  new RegExp(`${escape('dist-server')}[/\\\\].*`),
];
module.exports = config;
