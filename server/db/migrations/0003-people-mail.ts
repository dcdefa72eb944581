import { DataTypes, type QueryInterface } from 'sequelize';

const id = { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true, allowNull: false };
const date = (allowNull = true) => ({ type: DataTypes.DATE, allowNull });
const text = (allowNull = true) => ({ type: DataTypes.TEXT, allowNull });
const userRef = (onDelete: 'CASCADE' | 'SET NULL') => ({
  type: DataTypes.INTEGER,
  allowNull: onDelete === 'SET NULL',
  references: { model: 'users', key: 'id' },
  onDelete,
  onUpdate: 'CASCADE',
});

/**
 * The mail queue (every message we mean to send, retried until sent or failed), the
 * outbox the built-in SMTP server fills, invitations, password resets, and the owner of
 * each session so a user's sessions can be ended at once.
 */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('mail_queue', {
    id,
    recipients: text(false),
    subject: text(false),
    text_body: text(false),
    html_body: text(false),
    status: { type: DataTypes.STRING(10), allowNull: false, defaultValue: 'pending' },
    attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    next_attempt_at: date(false),
    last_error: text(),
    sent_at: date(),
    created_at: date(false),
    updated_at: date(false),
  });
  await qi.addIndex('mail_queue', ['status', 'next_attempt_at']);
  await qi.createTable('outbox_messages', {
    id,
    recipients: text(false),
    sender: text(false),
    subject: text(false),
    text_body: text(false),
    html_body: text(),
    sent_at: date(false),
  });
  await qi.createTable('invitations', {
    id,
    email: { type: DataTypes.STRING(254), allowNull: false },
    role: { type: DataTypes.STRING(20), allowNull: false },
    token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    invited_by: userRef('SET NULL'),
    expires_at: date(false),
    accepted_at: date(),
    revoked_at: date(),
    created_at: date(false),
    updated_at: date(false),
  });
  await qi.addIndex('invitations', ['email']);
  await qi.createTable('password_resets', {
    id,
    user_id: userRef('CASCADE'),
    token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    expires_at: date(false),
    used_at: date(),
    created_at: date(false),
  });
  await qi.addColumn('sessions', 'user_id', { type: DataTypes.INTEGER, allowNull: true });
  await qi.addIndex('sessions', ['user_id']);
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.removeIndex('sessions', ['user_id']);
  await qi.removeColumn('sessions', 'user_id');
  for (const table of ['password_resets', 'invitations', 'outbox_messages', 'mail_queue']) {
    await qi.dropTable(table);
  }
}
