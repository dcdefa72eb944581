import { mkdirSync } from 'node:fs';
import { dirname } from 'node:path';
import { Sequelize } from 'sequelize';
import { parseDatabaseUrl } from './database-url';

interface SqliteConnection {
  configure(option: 'busyTimeout', ms: number): void;
  run(sql: string, callback?: (error: Error | null) => void): void;
  filename: string;
  uuid?: string;
}
interface SqliteConnectionManager {
  connections: Record<string, SqliteConnection>;
  getConnection(options?: { uuid?: string }): Promise<SqliteConnection>;
  releaseConnection(connection: SqliteConnection, force?: boolean): unknown;
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
  // A first run (or create-admin before the first start) makes the database's folder.
  if (target.storage !== ':memory:') mkdirSync(dirname(target.storage), { recursive: true });
  const sequelize = new Sequelize({ dialect: 'sqlite', storage: target.storage, logging, define });
  reuseConnections(sequelize);
  if (target.storage !== ':memory:') await sequelize.query('PRAGMA journal_mode = WAL;');
  await sequelize.query('PRAGMA synchronous = NORMAL;');
  return sequelize;
}

/**
 * Sequelize opens a SQLite connection for every transaction and closes it afterwards: each
 * write paid for opening the file, reading the schema and a full sync at commit (the
 * `synchronous` pragma is per connection). Here a transaction's connection is kept when the
 * transaction ends and handed to the next one, and every connection gets the same settings:
 * a busy timeout (Sequelize sets none, so a concurrent writer would fail at once) and
 * `synchronous = NORMAL`, which in WAL mode loses no committed write when the process dies.
 */
function reuseConnections(sequelize: Sequelize): void {
  const manager = sequelize.connectionManager as unknown as SqliteConnectionManager;
  const getConnection = manager.getConnection.bind(manager);
  const releaseConnection = manager.releaseConnection.bind(manager);
  const configured = new WeakSet<SqliteConnection>();
  let parked = 0;
  const idle: string[] = [];
  manager.getConnection = async (options) => {
    const uuid = options?.uuid;
    const key = idle.pop();
    if (uuid && uuid !== 'default' && key) {
      const connection = manager.connections[key]!;
      delete manager.connections[key];
      manager.connections[uuid] = connection;
      return connection;
    }
    if (key) idle.push(key);
    const connection = await getConnection(options);
    if (!configured.has(connection)) {
      connection.configure('busyTimeout', BUSY_TIMEOUT_MS);
      connection.run('PRAGMA synchronous = NORMAL');
      configured.add(connection);
    }
    return connection;
  };
  // Parked under a key of their own in `connections`, so closing Sequelize closes them too.
  manager.releaseConnection = (connection, force) => {
    if (force || !connection.uuid || connection.filename === ':memory:' || idle.length >= 4) {
      return releaseConnection(connection, force);
    }
    delete manager.connections[connection.uuid];
    const key = `idle-${(parked += 1)}`;
    manager.connections[key] = connection;
    idle.push(key);
  };
}
