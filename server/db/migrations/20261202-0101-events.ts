import { DataTypes } from 'sequelize';
import type { Migration } from '../migrator';

/** Shows: the event, its classes and judging sheet, its people and invitations, entries and the audit trail. */
export const up: Migration = async ({ context: { queryInterface: qi } }) => {
  const now = { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW };
  const ref = (model: string, onDelete = 'CASCADE', allowNull = false) => ({ type: DataTypes.INTEGER, allowNull, references: { model, key: 'id' }, onDelete });

  await qi.createTable('events', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    name: { type: DataTypes.STRING(120), allowNull: false },
    slug: { type: DataTypes.STRING(60), allowNull: false, unique: true },
    status: { type: DataTypes.STRING(24), allowNull: false, defaultValue: 'draft' },
    venue_name: { type: DataTypes.STRING(200), allowNull: false },
    venue_address: { type: DataTypes.STRING(400), allowNull: false, defaultValue: '' },
    time_zone: { type: DataTypes.STRING(64), allowNull: false },
    starts_at: { type: DataTypes.DATE, allowNull: false },
    ends_at: { type: DataTypes.DATE, allowNull: false },
    registration_opens_at: { type: DataTypes.DATE, allowNull: false },
    registration_closes_at: { type: DataTypes.DATE, allowNull: false },
    capacity: { type: DataTypes.INTEGER, allowNull: true },
    entry_fee: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    currency: { type: DataTypes.STRING(3), allowNull: false },
    refund_rule: { type: DataTypes.JSONB, allowNull: false },
    description: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    // The last entry number given: the row is locked FOR UPDATE while a number is taken, so numbers have no gaps or twins.
    last_entry_number: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    created_by: ref('users', 'SET NULL', true),
    created_at: now,
    updated_at: now,
  });
  await qi.sequelize.query(`ALTER TABLE events ADD CONSTRAINT events_dates CHECK (ends_at > starts_at AND registration_closes_at <= starts_at AND registration_opens_at < registration_closes_at)`);
  await qi.sequelize.query(`ALTER TABLE events ADD CONSTRAINT events_fee CHECK (entry_fee >= 0)`);

  await qi.createTable('event_classes', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    event_id: ref('events'),
    name: { type: DataTypes.STRING(80), allowNull: false },
    description: { type: DataTypes.STRING(1000), allowNull: false, defaultValue: '' },
    position: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    capacity: { type: DataTypes.INTEGER, allowNull: true },
    created_at: now,
    updated_at: now,
  });
  await qi.addIndex('event_classes', ['event_id', 'position']);

  await qi.createTable('criteria', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    event_id: ref('events'),
    name: { type: DataTypes.STRING(80), allowNull: false },
    max_points: { type: DataTypes.INTEGER, allowNull: false },
    weight: { type: DataTypes.DECIMAL(6, 2), allowNull: false },
    tie_break_order: { type: DataTypes.INTEGER, allowNull: true },
    position: { type: DataTypes.INTEGER, allowNull: false },
    created_at: now,
    updated_at: now,
  });
  await qi.addIndex('criteria', ['event_id', 'position']);

  await qi.createTable('event_memberships', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    event_id: ref('events'),
    user_id: ref('users'),
    role: { type: DataTypes.STRING(16), allowNull: false },
    created_at: now,
    updated_at: now,
  });
  await qi.addIndex('event_memberships', ['event_id', 'user_id', 'role'], { unique: true });
  await qi.addIndex('event_memberships', ['user_id']);

  await qi.createTable('event_invitations', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    event_id: ref('events'),
    email: { type: DataTypes.STRING(254), allowNull: false },
    role: { type: DataTypes.STRING(16), allowNull: false },
    // Only the SHA-256 of the link's token is kept.
    token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    accepted_at: { type: DataTypes.DATE, allowNull: true },
    accepted_by: ref('users', 'SET NULL', true),
    revoked_at: { type: DataTypes.DATE, allowNull: true },
    invited_by: ref('users', 'SET NULL', true),
    created_at: now,
    updated_at: now,
  });
  await qi.addIndex('event_invitations', ['event_id']);

  await qi.createTable('entries', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    event_id: ref('events'),
    build_id: ref('builds'),
    class_id: ref('event_classes', 'RESTRICT'),
    owner_id: ref('users'),
    number: { type: DataTypes.INTEGER, allowNull: true },
    status: { type: DataTypes.STRING(20), allowNull: false },
    fee_amount: { type: DataTypes.INTEGER, allowNull: false },
    currency: { type: DataTypes.STRING(3), allowNull: false },
    payment_ref: { type: DataTypes.STRING(255), allowNull: true },
    paid_at: { type: DataTypes.DATE, allowNull: true },
    paid_amount: { type: DataTypes.INTEGER, allowNull: true },
    refund_due: { type: DataTypes.INTEGER, allowNull: true },
    withdrawn_at: { type: DataTypes.DATE, allowNull: true },
    waitlisted_at: { type: DataTypes.DATE, allowNull: true },
    offer_expires_at: { type: DataTypes.DATE, allowNull: true },
    checked_in_at: { type: DataTypes.DATE, allowNull: true },
    created_at: now,
    updated_at: now,
  });
  await qi.addIndex('entries', ['event_id', 'build_id'], { unique: true, name: 'entries_one_per_build' });
  // NULLs (waiting list) do not collide in a PostgreSQL unique index.
  await qi.addIndex('entries', ['event_id', 'number'], { unique: true, name: 'entries_number_unique' });
  await qi.addIndex('entries', ['owner_id']);
  await qi.addIndex('entries', ['build_id']);

  await qi.createTable('audit_lines', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    event_id: ref('events'),
    entry_id: ref('entries', 'CASCADE', true),
    actor_id: ref('users', 'SET NULL', true),
    action: { type: DataTypes.STRING(40), allowNull: false },
    before: { type: DataTypes.JSONB, allowNull: true },
    after: { type: DataTypes.JSONB, allowNull: true },
    created_at: now,
  });
  await qi.addIndex('audit_lines', ['event_id', 'id']);
  await qi.addIndex('audit_lines', ['entry_id']);
};

export const down: Migration = async ({ context: { queryInterface: qi } }) => {
  for (const t of ['audit_lines', 'entries', 'event_invitations', 'event_memberships', 'criteria', 'event_classes', 'events']) await qi.dropTable(t);
};
