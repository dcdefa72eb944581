import type { Sequelize, Transaction } from 'sequelize';

/**
 * The one place that reaches past Sequelize to the sqlite3 driver. Nothing else may touch
 * `connectionManager` or a transaction's `connection`; a new need for the driver is a new
 * function here, with its reason.
 *
 * 1. `runOnConnection`: a statement with thousands of positional `?` values goes straight to
 *    the transaction's own connection. Through `sequelize.query` every value would be inlined
 *    into the SQL text (or sent as named `$n` binds, which SQLite resolves one by one) and
 *    Sequelize's statement-kind regexes would run over that text.
 * 2. `keepConnections`: Sequelize's SQLite connection manager opens a connection for every
 *    transaction and closes it afterwards, so each write paid for opening the file, reading
 *    the schema and a full sync at commit. It offers no pool and no hook for new connections,
 *    so its `getConnection`/`releaseConnection` are wrapped (on this instance only): a
 *    transaction's connection is parked when it ends and handed to the next one (up to four),
 *    and every new connection gets a busy timeout and the dialect's per-connection settings.
 *    Parked connections stay in the manager's own table, so `sequelize.close()` closes them.
 *    Checked against Sequelize 6.37; an upgrade must re-run tests/server/db.
 * 3. `selectOnConnection`: a read on the hot path of every request (a print's record, the
 *    accession counter) goes to the transaction's connection, or outside a transaction to
 *    the connection Sequelize itself uses for plain queries. Through `sequelize.query` each
 *    statement captured a stack trace and formatted it (through source maps under tsx),
 *    ran its statement-kind regexes and parsers: about 0.3 ms of CPU a statement, more than
 *    SQLite took to answer. Rows come back as SQLite stores them; the caller decodes them.
 */

interface SqliteConnection {
  configure(option: 'busyTimeout', ms: number): void;
  run(sql: string, params: unknown[], callback?: (error: Error | null) => void): void;
  run(sql: string, callback?: (error: Error | null) => void): void;
  all(
    sql: string,
    params: unknown[],
    callback: (error: Error | null, rows: unknown[]) => void,
  ): void;
  filename: string;
  uuid?: string;
}

interface SqliteConnectionManager {
  connections: Record<string, SqliteConnection>;
  getConnection(options?: { uuid?: string }): Promise<SqliteConnection>;
  releaseConnection(connection: SqliteConnection, force?: boolean): unknown;
}

/** Runs one statement with positional values on the transaction's own SQLite connection. */
export function runOnConnection(
  transaction: Transaction,
  sql: string,
  values: readonly unknown[],
): Promise<void> {
  const connection = (transaction as unknown as { connection: SqliteConnection }).connection;
  const bound = values.map((value) => (typeof value === 'boolean' ? Number(value) : value));
  return new Promise((resolve, reject) =>
    connection.run(sql, bound, (error) => (error ? reject(error) : resolve())),
  );
}

/**
 * Runs one SELECT with positional values on the transaction's connection, or without one on
 * Sequelize's own connection for plain queries; the rows as the driver gives them.
 */
export async function selectOnConnection<T>(
  sequelize: Sequelize,
  sql: string,
  values: readonly unknown[],
  transaction?: Transaction | null,
): Promise<T[]> {
  const connection = transaction
    ? (transaction as unknown as { connection: SqliteConnection }).connection
    : await (sequelize.connectionManager as unknown as SqliteConnectionManager).getConnection();
  const bound = values.map((value) => (typeof value === 'boolean' ? Number(value) : value));
  return new Promise((resolve, reject) =>
    connection.all(sql, bound, (error, rows) => (error ? reject(error) : resolve(rows as T[]))),
  );
}

/** Keeps up to four SQLite connections between transactions and configures each new one. */
export function keepConnections(
  sequelize: Sequelize,
  options: { busyTimeoutMs: number; connectionSettings: readonly string[] },
): void {
  const manager = sequelize.connectionManager as unknown as SqliteConnectionManager;
  const getConnection = manager.getConnection.bind(manager);
  const releaseConnection = manager.releaseConnection.bind(manager);
  const configured = new WeakSet<SqliteConnection>();
  let parked = 0;
  const idle: string[] = [];
  manager.getConnection = async (request) => {
    const uuid = request?.uuid;
    const key = idle.pop();
    if (uuid && uuid !== 'default' && key) {
      const connection = manager.connections[key]!;
      delete manager.connections[key];
      manager.connections[uuid] = connection;
      return connection;
    }
    if (key) idle.push(key);
    const connection = await getConnection(request);
    if (!configured.has(connection)) {
      connection.configure('busyTimeout', options.busyTimeoutMs);
      for (const setting of options.connectionSettings) connection.run(setting);
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
