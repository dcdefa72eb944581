import { existsSync, mkdirSync, writeFileSync } from 'node:fs';
import { cpus, totalmem } from 'node:os';
import type { SuiteModule } from './suite';

/** Every suite the contract names, in the order `npm run bench` runs them. */
const KNOWN = ['api', 'search', 'images', 'tone', 'import', 'movements', 'client'] as const;

const asked = process.argv.slice(2).filter((arg) => !arg.startsWith('-'));
const unknown = asked.filter((name) => !(KNOWN as readonly string[]).includes(name));
if (unknown.length) {
  console.error(`Unknown suite(s): ${unknown.join(', ')}. Known: ${KNOWN.join(', ')}.`);
  process.exit(2);
}
const present = (name: string) => existsSync(new URL(`./${name}/index.ts`, import.meta.url));
const chosen = asked.length ? asked : KNOWN.filter(present);

const machine = {
  node: process.version,
  cpus: cpus().length,
  cpu: cpus()[0]?.model ?? 'unknown',
  memoryGiB: Math.round(totalmem() / 2 ** 30),
};
const all: Record<string, unknown> = {};
mkdirSync('bench/results', { recursive: true });
for (const suite of chosen) {
  if (!present(suite)) {
    console.error(`Suite ${suite} is not built yet.`);
    process.exit(2);
  }
  console.log(`\n== ${suite} ==`);
  const module = (await import(`./${suite}/index.ts`)) as SuiteModule;
  const result = await module.run();
  const report = { suite, at: new Date().toISOString(), machine, ...result };
  writeFileSync(`bench/results/${suite}.json`, `${JSON.stringify(report, null, 2)}\n`);
  console.table(result.ratios);
  console.log(`Wrote bench/results/${suite}.json`);
  all[suite] = report;
}
writeFileSync('bench/results/latest.json', `${JSON.stringify(all, null, 2)}\n`);
console.log('Wrote bench/results/latest.json');
