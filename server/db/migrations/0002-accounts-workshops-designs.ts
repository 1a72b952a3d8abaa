import type { Migration } from '../migrate.ts';

// Accounts, workshops with roles, invitations, password resets, and designs kept as immutable
// revisions with comments and approvals. A workshop's price list (materials issue) will be its
// own table keyed by workshop_id; `workshops.settings` holds small per-shop preferences.
export const up: Migration = async ({ context: { sequelize } }) => {
  await sequelize.query(`
    CREATE TABLE users (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      email text NOT NULL,
      name text NOT NULL,
      password_hash text NOT NULL,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      CONSTRAINT users_email_lower CHECK (email = lower(email))
    );
    CREATE UNIQUE INDEX users_email_unique ON users (email);

    CREATE TABLE workshops (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      name text NOT NULL,
      settings jsonb NOT NULL DEFAULT '{}'::jsonb,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );

    CREATE TABLE memberships (
      workshop_id uuid NOT NULL REFERENCES workshops(id) ON DELETE CASCADE,
      user_id uuid NOT NULL REFERENCES users(id) ON DELETE CASCADE,
      role text NOT NULL CHECK (role IN ('owner', 'designer', 'reviewer')),
      created_at timestamptz NOT NULL DEFAULT now(),
      PRIMARY KEY (workshop_id, user_id)
    );
    CREATE INDEX memberships_user ON memberships (user_id);

    CREATE TABLE invitations (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      workshop_id uuid NOT NULL REFERENCES workshops(id) ON DELETE CASCADE,
      email text NOT NULL CHECK (email = lower(email)),
      role text NOT NULL CHECK (role IN ('owner', 'designer', 'reviewer')),
      token_hash text NOT NULL UNIQUE,
      invited_by uuid REFERENCES users(id) ON DELETE SET NULL,
      expires_at timestamptz NOT NULL,
      accepted_at timestamptz,
      accepted_by uuid REFERENCES users(id) ON DELETE SET NULL,
      created_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE INDEX invitations_workshop ON invitations (workshop_id);

    CREATE TABLE password_resets (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      user_id uuid NOT NULL REFERENCES users(id) ON DELETE CASCADE,
      token_hash text NOT NULL UNIQUE,
      expires_at timestamptz NOT NULL,
      used_at timestamptz,
      created_at timestamptz NOT NULL DEFAULT now()
    );

    CREATE TABLE designs (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      workshop_id uuid NOT NULL REFERENCES workshops(id) ON DELETE CASCADE,
      title text NOT NULL,
      kind text NOT NULL CHECK (kind IN ('chest', 'dresser', 'cabinet')),
      head_revision integer NOT NULL DEFAULT 0 CHECK (head_revision >= 0),
      approved_revision integer,
      origin_design_id uuid REFERENCES designs(id) ON DELETE SET NULL,
      origin_revision integer,
      archived_at timestamptz,
      created_by uuid REFERENCES users(id) ON DELETE SET NULL,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE INDEX designs_workshop_updated ON designs (workshop_id, updated_at DESC);
    CREATE INDEX designs_origin ON designs (origin_design_id);

    CREATE TABLE revisions (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      design_id uuid NOT NULL REFERENCES designs(id) ON DELETE CASCADE,
      number integer NOT NULL CHECK (number >= 1),
      spec jsonb NOT NULL,
      engine_version text NOT NULL,
      summary jsonb NOT NULL,
      author_id uuid REFERENCES users(id) ON DELETE SET NULL,
      message text NOT NULL DEFAULT '',
      restored_from integer,
      created_at timestamptz NOT NULL DEFAULT now(),
      UNIQUE (design_id, number)
    );

    -- A revision is a record of what was saved: it may be deleted with its design, never changed.
    -- (Setting author_id to NULL when an account is deleted is the one update allowed.)
    CREATE FUNCTION revisions_immutable() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      IF NEW.design_id IS DISTINCT FROM OLD.design_id OR NEW.number IS DISTINCT FROM OLD.number
         OR NEW.spec IS DISTINCT FROM OLD.spec OR NEW.engine_version IS DISTINCT FROM OLD.engine_version
         OR NEW.summary IS DISTINCT FROM OLD.summary OR NEW.message IS DISTINCT FROM OLD.message
         OR NEW.restored_from IS DISTINCT FROM OLD.restored_from OR NEW.created_at IS DISTINCT FROM OLD.created_at
         OR (NEW.author_id IS DISTINCT FROM OLD.author_id AND NEW.author_id IS NOT NULL) THEN
        RAISE EXCEPTION 'revisions are immutable' USING ERRCODE = 'P0001';
      END IF;
      RETURN NEW;
    END $$;
    CREATE TRIGGER revisions_no_update BEFORE UPDATE ON revisions FOR EACH ROW EXECUTE FUNCTION revisions_immutable();

    CREATE TABLE comments (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      design_id uuid NOT NULL REFERENCES designs(id) ON DELETE CASCADE,
      revision_number integer,
      part_id text,
      author_id uuid REFERENCES users(id) ON DELETE SET NULL,
      body text NOT NULL,
      created_at timestamptz NOT NULL DEFAULT now(),
      FOREIGN KEY (design_id, revision_number) REFERENCES revisions(design_id, number) ON DELETE CASCADE
    );
    CREATE INDEX comments_design ON comments (design_id, created_at);

    CREATE TABLE approvals (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      design_id uuid NOT NULL REFERENCES designs(id) ON DELETE CASCADE,
      revision_number integer NOT NULL,
      reviewer_id uuid REFERENCES users(id) ON DELETE SET NULL,
      decision text NOT NULL CHECK (decision IN ('approved', 'changes_requested')),
      note text NOT NULL DEFAULT '',
      created_at timestamptz NOT NULL DEFAULT now(),
      FOREIGN KEY (design_id, revision_number) REFERENCES revisions(design_id, number) ON DELETE CASCADE
    );
    CREATE INDEX approvals_design ON approvals (design_id, created_at);
  `);
};

export const down: Migration = async ({ context: { sequelize } }) => {
  await sequelize.query(`
    DROP TABLE IF EXISTS approvals, comments;
    DROP TRIGGER IF EXISTS revisions_no_update ON revisions;
    DROP FUNCTION IF EXISTS revisions_immutable();
    DROP TABLE IF EXISTS revisions, designs, password_resets, invitations, memberships, workshops, users;
  `);
};
