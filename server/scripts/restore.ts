import { loadConfig } from '../config';
import { restoreDatabase } from '../db/backup';

const file = process.argv[2];
if (!file) {
  console.error('Usage: npm run restore -- FILE   (stop the server first)');
  process.exit(2);
}
await restoreDatabase(loadConfig().databaseUrl, file);
console.log(`Restored the database from ${file}; start the server again.`);
