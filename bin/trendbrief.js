#!/usr/bin/env node
// The command line from the bundle of dist/ (scripts/bundleCli.mjs, run by npm run build).
let runCli;
try {
  ({ runCli } = await import('../dist/bundle/cli.js'));
} catch (error) {
  if (error?.code !== 'ERR_MODULE_NOT_FOUND' || !String(error.message).includes('dist/bundle/cli.js')) throw error;
  // A checkout that was never built: a problem with the installation, exit 4 like a missing browser.
  process.stderr.write(`trendbrief is not built: ${new URL('..', import.meta.url).pathname} has no dist/bundle/cli.js; run npm run build there\n`);
  process.exit(4);
}
process.exitCode = await runCli(process.argv.slice(2));
