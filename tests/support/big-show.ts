import { randomBytes } from 'node:crypto';
import { QueryTypes } from 'sequelize';
import { sequelize } from '@server/db/sequelize';
import { BUILD_CODE_ALPHABET } from '@shared/schemas/build';
import { createUser } from './factories';
import { showWithClasses } from './event-factory';

/** Codes no other test makes: a random prefix and the car's index in the alphabet of codes. */
function codes(count: number): string[] {
  const a = BUILD_CODE_ALPHABET;
  const prefix = Array.from(randomBytes(3), (b) => a[b % a.length]).join('');
  return Array.from({ length: count }, (_, i) => prefix + [3, 2, 1, 0].map((p) => a[Math.floor(i / a.length ** p) % a.length]).join(''));
}

/**
 * A show with `count` confirmed cars in three classes, written in one transaction of two statements (the
 * product's rows, as entering and paying would leave them): car i is number i + 1, in class i mod 3,
 * titled "Field car <number>", every tenth checked in; number 4321 is the one "Teal salt roadster".
 */
export async function bigShow(count: number) {
  const show = await showWithClasses({ classes: [{ name: 'Hot rods' }, { name: 'Customs' }, { name: 'Trucks' }] });
  const { user } = await createUser({ name: 'Many Cars' });
  const titles = Array.from({ length: count }, (_, i) => (i + 1 === 4321 ? 'Teal salt roadster' : `Field car ${i + 1}`));
  await sequelize.transaction(async (transaction) => {
    const builds = await sequelize.query<{ id: number }>(
      `INSERT INTO builds (owner_id, code, title, published, created_at, updated_at) SELECT :owner, c, t, true, now(), now() FROM unnest(ARRAY[:codes]::text[], ARRAY[:titles]::text[]) AS x(c, t) RETURNING id`,
      { replacements: { owner: user.id, codes: codes(count), titles }, type: QueryTypes.SELECT, transaction },
    );
    await sequelize.query(
      `INSERT INTO entries (event_id, build_id, class_id, owner_id, number, status, fee_amount, currency, paid_at, paid_amount, created_at, updated_at)
       SELECT :event, b, (ARRAY[:classes]::int[])[(n - 1) % 3 + 1], :owner, n, CASE WHEN n % 10 = 0 THEN 'checked_in' ELSE 'confirmed' END, 2500, 'EUR', now(), 2500, now(), now()
         FROM unnest(ARRAY[:builds]::int[]) WITH ORDINALITY AS x(b, n)`,
      { replacements: { event: show.eventId, classes: show.classIds, owner: user.id, builds: builds.map((b) => b.id) }, transaction },
    );
  });
  return show;
}

