import { Sequelize } from 'sequelize';
import { parseDatabaseUrl } from './database-url';

interface SqliteConnection {
  configure(option: 'busyTimeout', ms: number): void;
}
interface ConnectionManagerWithGet {
  getConnection(options?: unknown): Promise<SqliteConnection>;
}

/** How long a writer waits for another connection's lock before SQLITE_BUSY. */
const BUSY_TIMEOUT_MS = 10_000;

/** Opens the database named by DATABASE_URL; SQLite in WAL mode with foreign keys on. */
export async function openDatabase(url: string, logging = false): Promise<Sequelize> {
  const target = parseDatabaseUrl(url);
  const define = { underscored: true };
  if (target.dialect === 'postgres') {
    const sequelize = new Sequelize(target.url, { logging, define });
    await sequelize.authenticate();
    return sequelize;
  }
  const sequelize = new Sequelize({ dialect: 'sqlite', storage: target.storage, logging, define });
  waitOnBusy(sequelize);
  if (target.storage !== ':memory:') await sequelize.query('PRAGMA journal_mode = WAL;');
  await sequelize.query('PRAGMA synchronous = NORMAL;');
  return sequelize;
}

/**
 * Sequelize opens a SQLite connection per transaction and turns foreign keys on for each,
 * but sets no busy timeout, so concurrent writers would fail at once. Give every new
 * connection one.
 */
function waitOnBusy(sequelize: Sequelize): void {
  const manager = sequelize.connectionManager as unknown as ConnectionManagerWithGet;
  const getConnection = manager.getConnection.bind(manager);
  const configured = new WeakSet<SqliteConnection>();
  manager.getConnection = async (options) => {
    const connection = await getConnection(options);
    if (!configured.has(connection)) {
      connection.configure('busyTimeout', BUSY_TIMEOUT_MS);
      configured.add(connection);
    }
    return connection;
  };
}
