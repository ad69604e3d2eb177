// The Knex command line looks for knexfile.js first; this one teaches Node TypeScript (through
// tsx, which the project already uses) and hands over to knexfile.ts, where the settings live.
require('tsx/cjs/api').register();
module.exports = require('./knexfile.ts').default;
