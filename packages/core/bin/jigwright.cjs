#!/usr/bin/env node
// Runs the command line from the TypeScript sources, so that `npx jigwright` works right after `npm ci`.
require('tsx/cjs/api').register();
const { main } = require('../src/cli/main.ts');
main(process.argv.slice(2)).then(
  (code) => process.exit(code),
  (error) => {
    process.stderr.write(`jigwright: ${error instanceof Error ? error.message : String(error)}\n`);
    process.exit(2);
  },
);
