// Compiles the server and its command-line scripts to plain JavaScript under dist/
// (dist/server/index.js is the production entry), then stamps the build so `npm start`
// can tell whether it is older than the sources.
import { writeFileSync } from 'node:fs';
import { build } from 'esbuild';

const entryPoints = [
  'server/index.ts',
  'server/scripts/create-admin.ts',
  'server/scripts/backup.ts',
  'server/scripts/restore.ts',
  'server/scripts/fixity.ts',
  'server/scripts/digest.ts',
];

await build({
  entryPoints,
  outdir: 'dist',
  outbase: '.',
  bundle: true,
  // npm packages stay in node_modules; only our own code (server, shared, seeds) is bundled.
  packages: 'external',
  platform: 'node',
  format: 'esm',
  target: 'node20',
  sourcemap: true,
  logLevel: 'warning',
});
writeFileSync('dist/.build-stamp', `${new Date().toISOString()}\n`);
console.log(`Server compiled to dist/server (${entryPoints.length} entry points).`);
