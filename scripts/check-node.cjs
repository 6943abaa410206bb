// Run before `npm ci`/`npm install` and `npm start`: says plainly when Node is older than
// package.json's engines.node (npm itself only warns). Plain old syntax on purpose: it must
// run on the old Node it is warning about.
var wanted = require('../package.json').engines.node; // e.g. ">=20"
var least = Number(/(\d+)/.exec(wanted)[1]);
var have = process.versions.node;
if (Number(have.split('.')[0]) < least) {
  console.error('Loadtrace needs Node ' + least + ' or newer (package.json engines: "' + wanted + '"); this is Node ' + have + '.');
  console.error('Install Node ' + least + ' (e.g. from your system packages or nodejs.org), then run the command again.');
  process.exit(1);
}
