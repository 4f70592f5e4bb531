// The training casebook: finished cases a lead marks for teaching (with what to hide), ordered
// courses of them for one apprentice or all, scored prediction attempts with one row per
// prediction, and course sign-offs.
import type { MigrationFn } from 'umzug';
import type { QueryInterface } from 'sequelize';

export const up: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.sequelize.query(`
    CREATE TABLE training_cases (
      id uuid PRIMARY KEY,
      workshop_id uuid NOT NULL REFERENCES workshops(id),
      case_id uuid NOT NULL UNIQUE REFERENCES cases(id),
      teaching_note text NOT NULL CHECK (length(teaching_note) BETWEEN 3 AND 2000),
      difficulty varchar(20) NOT NULL CHECK (difficulty IN ('starter', 'practised', 'advanced')),
      hide_notes boolean NOT NULL DEFAULT false,
      hidden_attachment_ids uuid[] NOT NULL DEFAULT '{}',
      withdrawn boolean NOT NULL DEFAULT false,
      marked_by uuid NOT NULL REFERENCES users(id),
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE INDEX training_cases_workshop_idx ON training_cases (workshop_id, created_at);

    CREATE TABLE training_courses (
      id uuid PRIMARY KEY,
      workshop_id uuid NOT NULL REFERENCES workshops(id),
      title varchar(160) NOT NULL,
      description text,
      -- NULL: the course is for every apprentice of the workshop.
      apprentice_id uuid REFERENCES users(id),
      created_by uuid NOT NULL REFERENCES users(id),
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE INDEX training_courses_workshop_idx ON training_courses (workshop_id, created_at);

    CREATE TABLE training_course_items (
      course_id uuid NOT NULL REFERENCES training_courses(id) ON DELETE CASCADE,
      training_case_id uuid NOT NULL REFERENCES training_cases(id),
      position integer NOT NULL CHECK (position >= 0),
      PRIMARY KEY (course_id, training_case_id),
      UNIQUE (course_id, position)
    );

    CREATE TABLE training_attempts (
      id uuid PRIMARY KEY,
      workshop_id uuid NOT NULL REFERENCES workshops(id),
      training_case_id uuid NOT NULL REFERENCES training_cases(id),
      apprentice_id uuid NOT NULL REFERENCES users(id),
      status varchar(20) NOT NULL DEFAULT 'in_progress'
        CHECK (status IN ('in_progress', 'finished')),
      score integer NOT NULL DEFAULT 0 CHECK (score >= 0),
      max_score integer NOT NULL CHECK (max_score >= 0),
      started_at timestamptz NOT NULL DEFAULT now(),
      finished_at timestamptz,
      CHECK (score <= max_score),
      CHECK ((status = 'finished') = (finished_at IS NOT NULL))
    );
    CREATE INDEX training_attempts_apprentice_idx
      ON training_attempts (workshop_id, apprentice_id, started_at);
    CREATE INDEX training_attempts_case_idx ON training_attempts (training_case_id);

    -- One row per prediction, written as it is made: never updated.
    CREATE TABLE training_predictions (
      attempt_id uuid NOT NULL REFERENCES training_attempts(id) ON DELETE CASCADE,
      step_index integer NOT NULL CHECK (step_index >= 0),
      workshop_id uuid NOT NULL REFERENCES workshops(id),
      kind varchar(20) NOT NULL CHECK (kind IN ('next', 'meaning', 'cause')),
      node_id varchar(80) NOT NULL,
      step_title varchar(200) NOT NULL,
      chosen_id varchar(120) NOT NULL,
      correct_id varchar(120) NOT NULL,
      points integer NOT NULL CHECK (points >= 0),
      max_points integer NOT NULL CHECK (max_points > 0 AND points <= max_points),
      created_at timestamptz NOT NULL DEFAULT now(),
      PRIMARY KEY (attempt_id, step_index)
    );

    CREATE TABLE training_sign_offs (
      course_id uuid NOT NULL REFERENCES training_courses(id),
      apprentice_id uuid NOT NULL REFERENCES users(id),
      workshop_id uuid NOT NULL REFERENCES workshops(id),
      signed_by uuid NOT NULL REFERENCES users(id),
      note text,
      signed_at timestamptz NOT NULL DEFAULT now(),
      PRIMARY KEY (course_id, apprentice_id)
    );
  `);
};

export const down: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.sequelize.query(`
    DROP TABLE training_sign_offs;
    DROP TABLE training_predictions;
    DROP TABLE training_attempts;
    DROP TABLE training_course_items;
    DROP TABLE training_courses;
    DROP TABLE training_cases;
  `);
};
