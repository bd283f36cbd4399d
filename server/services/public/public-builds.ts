import { Op, QueryTypes, literal } from 'sequelize';
import { BuildCodeSchema, PUBLIC_BUILDS_PER_PAGE, type PublicBuildSearch } from '@shared/schemas/build';
import { sequelize } from '../../db/sequelize';
import { Build } from '../../models/build';
import { Photo } from '../../models/photo';
import { canViewPublic } from '../../policies/build';
import { loadFullBuild } from '../builds/builds';

/**
 * A fingerprint of everything the public page shows, in one cheap query: the newest change and
 * the row count of the build, its owner and each child table (a deleted photo changes the count).
 * Null when the code is unknown or the build is not published: callers answer both the same.
 */
export async function publicVersion(code: string): Promise<string | null> {
  if (!BuildCodeSchema.safeParse(code).success) return null;
  const rows = await sequelize.query<{ published: boolean; disabled_at: Date | null; version: string }>(
    `SELECT b.published, u.disabled_at,
            concat_ws(':', extract(epoch FROM greatest(b.updated_at, u.updated_at, s.at, p.at, d.at, w.at, en.at, lp.at, qa.at))::text, s.n, p.n, d.n, w.n, en.n, lp.n, qa.n) AS version
       FROM builds b
       JOIN users u ON u.id = b.owner_id
       CROSS JOIN LATERAL (SELECT max(updated_at) AS at, count(*) AS n FROM build_sections WHERE build_id = b.id) s
       CROSS JOIN LATERAL (SELECT max(updated_at) AS at, count(*) AS n FROM photos WHERE build_id = b.id) p
       CROSS JOIN LATERAL (SELECT max(updated_at) AS at, count(*) AS n FROM dyno_runs WHERE build_id = b.id) d
       CROSS JOIN LATERAL (SELECT max(updated_at) AS at, count(*) AS n FROM weigh_ins WHERE build_id = b.id) w
       -- The published log posts and the answered questions are on the page (a draft or a waiting question is not).
       CROSS JOIN LATERAL (SELECT max(updated_at) AS at, count(*) AS n FROM build_log_posts WHERE build_id = b.id AND status = 'published') lp
       CROSS JOIN LATERAL (SELECT max(updated_at) AS at, count(*) AS n FROM build_questions WHERE build_id = b.id AND answer IS NOT NULL) qa
       -- The show the car is entered in is on the page: its entry, class and show change the page too.
       CROSS JOIN LATERAL (SELECT max(greatest(x.updated_at, ev.updated_at, c.updated_at)) AS at, count(*) AS n
                             FROM entries x JOIN events ev ON ev.id = x.event_id JOIN event_classes c ON c.id = x.class_id
                            WHERE x.build_id = b.id) en
      WHERE b.code = :code`,
    { replacements: { code }, type: QueryTypes.SELECT },
  );
  const row = rows[0];
  return row && canViewPublic({ published: row.published }, { disabledAt: row.disabled_at }) ? row.version : null;
}

/** A published build with all the public presenter reads (its owner's name included), or null for an unknown or unpublished code. */
export async function loadPublicBuild(code: string): Promise<Build | null> {
  if (!BuildCodeSchema.safeParse(code).success) return null;
  const build = await loadFullBuild({ code });
  return build && canViewPublic(build, build.owner) ? build : null;
}

// Published builds of accounts that are not disabled: what anyone may see.
const PUBLIC_WHERE = { published: true, ownerId: { [Op.notIn]: literal('(SELECT id FROM users WHERE disabled_at IS NOT NULL)') } };

/** The most recently changed published builds, for the home page. */
export const listRecentPublicBuilds = (limit: number) =>
  Build.findAll({ where: PUBLIC_WHERE, include: [{ model: Photo, as: 'photos' }], order: [['updatedAt', 'DESC'], ['id', 'DESC']], limit });

// The search is a substring of the title: % and _ typed by a person are plain characters.
const likePattern = (q: string) => `%${q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;

/** One page of published builds whose title holds `q` (any case) and of the chosen style, newest change first, with the total. */
export async function searchPublicBuilds(search: PublicBuildSearch): Promise<{ builds: Build[]; total: number; pages: number }> {
  const where = {
    ...PUBLIC_WHERE,
    ...(search.q ? { title: { [Op.iLike]: likePattern(search.q) } } : {}),
    ...(search.style ? { style: search.style } : {}),
  };
  const total = await Build.count({ where });
  const builds = await Build.findAll({
    where,
    include: [{ model: Photo, as: 'photos' }],
    order: [['updatedAt', 'DESC'], ['id', 'DESC']],
    limit: PUBLIC_BUILDS_PER_PAGE,
    offset: (search.page - 1) * PUBLIC_BUILDS_PER_PAGE,
  });
  return { builds, total, pages: Math.max(1, Math.ceil(total / PUBLIC_BUILDS_PER_PAGE)) };
}
