import { bootstrap } from '../bootstrap';
import { loadConfig } from '../config';
import { runFixityCheck, startFixityCheck } from '../services/fixity/run-fixity';

/** `npm run fixity`: re-hash every stored original; exits 1 on any mismatch or missing file. */
const ctx = await bootstrap(loadConfig(), { worker: false });
const fixity = { sequelize: ctx.sequelize, storage: ctx.images.storage };
const check = await startFixityCheck(fixity, null);
console.log(`Checking ${check.total} stored original(s)…`);
const done = await runFixityCheck(fixity, check);
for (const { assetId, expected, actual } of done.mismatches) {
  console.log(`MISMATCH asset ${assetId}: recorded ${expected}, now ${actual}`);
}
for (const assetId of done.missing)
  console.log(`MISSING  asset ${assetId}: the stored file is gone`);
console.log(
  `${done.status}: ${done.checked}/${done.total} checked, ${done.mismatches.length} mismatch(es), ${done.missing.length} missing`,
);
await ctx.closeDatabase();
process.exit(done.status === 'done' && !done.mismatches.length && !done.missing.length ? 0 : 1);
