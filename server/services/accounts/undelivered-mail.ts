import { QueryTypes } from 'sequelize';
import type { UndeliveredMail } from '@shared/schemas/mail';
import { sequelize } from '../../db/sequelize';
import { MAIL_QUEUE, MAIL_UNDELIVERED_QUEUE } from '../../jobs/queue';

type Row = { id: string; name: string; state: string; data: { to?: string; subject?: string } | null; output: { message?: string } | null; retry_count: number; created_on: Date };

/**
 * What the site admin must see: mail the mail server refused or could not be reached for. Read from
 * pg-boss's own table: jobs of the mail queue waiting for another try, and the dead letters kept
 * after the last try failed. A queue that has never started has no table yet: nothing failed.
 */
export async function listUndeliveredMail(schema = 'pgboss', limit = 100): Promise<UndeliveredMail[]> {
  if (!/^[a-z_][a-z0-9_]*$/.test(schema)) throw new RangeError(`not a schema name: ${schema}`);
  const rows = await sequelize
    .query<Row>(
      // A failed job carries the mail server's last error; its dead letter (kept longer) only the mail.
      `SELECT id, name, state, data, output, retry_count, created_on FROM ${schema}.job j
        WHERE (name = $1 AND state IN ('retry', 'failed'))
           OR (name = $2 AND NOT EXISTS (SELECT 1 FROM ${schema}.job f WHERE f.name = $1 AND f.state = 'failed' AND f.data = j.data))
        ORDER BY created_on DESC LIMIT $3`,
      { bind: [MAIL_QUEUE, MAIL_UNDELIVERED_QUEUE, limit], type: QueryTypes.SELECT },
    )
    .catch((err: { original?: { code?: string } }) => {
      if (err.original?.code === '42P01' || err.original?.code === '3F000') return [] as Row[];
      throw err;
    });
  return rows.map((r) => ({
    id: r.id,
    to: r.data?.to ?? '',
    subject: r.data?.subject ?? '(no subject)',
    status: r.name === MAIL_QUEUE && r.state === 'retry' ? 'retrying' : 'gave_up',
    attempts: r.retry_count,
    lastError: r.output?.message ?? null,
    queuedAt: new Date(r.created_on).toISOString(),
  }));
}
