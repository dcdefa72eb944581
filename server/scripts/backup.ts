import { loadConfig } from '../config';
import { backupDatabase } from '../db/backup';

const file = process.argv[2];
if (!file) {
  console.error('Usage: npm run backup -- FILE');
  process.exit(2);
}
await backupDatabase(loadConfig().databaseUrl, file);
console.log(`Backed up the database to ${file}`);
