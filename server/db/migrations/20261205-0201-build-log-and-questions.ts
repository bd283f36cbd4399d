import type { Migration } from '../migrator';

// The build log (dated posts, draft or published, photos of the build chosen by id, at most one linked
// dyno run or weigh-in) and the questions people ask about a build. A visitor's question keeps no
// address, name or contact: only its words, when it came and whether the owner answered it.
export const up: Migration = async ({ context: { queryInterface: qi } }) => {
  await qi.sequelize.query(`
    CREATE TABLE build_log_posts (
      id SERIAL PRIMARY KEY,
      build_id INTEGER NOT NULL REFERENCES builds(id) ON DELETE CASCADE,
      posted_on DATE NOT NULL,
      title TEXT NOT NULL,
      body TEXT NOT NULL,
      status TEXT NOT NULL DEFAULT 'draft' CONSTRAINT build_log_posts_status_known CHECK (status IN ('draft', 'published')),
      photo_ids INTEGER[] NOT NULL DEFAULT '{}',
      dyno_run_id INTEGER REFERENCES dyno_runs(id) ON DELETE SET NULL,
      weigh_in_id INTEGER REFERENCES weigh_ins(id) ON DELETE SET NULL,
      created_at TIMESTAMPTZ NOT NULL DEFAULT now(),
      updated_at TIMESTAMPTZ NOT NULL DEFAULT now(),
      CONSTRAINT build_log_posts_one_measurement CHECK (dyno_run_id IS NULL OR weigh_in_id IS NULL)
    );
    CREATE INDEX build_log_posts_build_date ON build_log_posts (build_id, posted_on DESC, id DESC);

    CREATE TABLE build_questions (
      id SERIAL PRIMARY KEY,
      build_id INTEGER NOT NULL REFERENCES builds(id) ON DELETE CASCADE,
      question TEXT NOT NULL,
      answer TEXT,
      asked_count INTEGER NOT NULL DEFAULT 1 CONSTRAINT build_questions_asked_positive CHECK (asked_count >= 1),
      from_visitor BOOLEAN NOT NULL DEFAULT FALSE,
      answered_at TIMESTAMPTZ,
      created_at TIMESTAMPTZ NOT NULL DEFAULT now(),
      updated_at TIMESTAMPTZ NOT NULL DEFAULT now(),
      CONSTRAINT build_questions_answered_together CHECK ((answer IS NULL) = (answered_at IS NULL))
    );
    CREATE INDEX build_questions_build ON build_questions (build_id, (answer IS NULL));
  `);
};

export const down: Migration = async ({ context: { queryInterface: qi } }) => {
  await qi.dropTable('build_questions');
  await qi.dropTable('build_log_posts');
};
