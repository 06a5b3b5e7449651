/**
 * Numbered schema migrations, applied in order at start. Never edit a
 * migration that has shipped: add the next number.
 */
export const MIGRATIONS: { version: number; sql: string }[] = [
  {
    version: 1,
    sql: `
      CREATE TABLE mechanisms (
        id TEXT PRIMARY KEY,
        title TEXT NOT NULL,
        description TEXT NOT NULL,
        text TEXT NOT NULL,
        format TEXT NOT NULL CHECK (format IN ('yaml', 'json')),
        species_count INTEGER NOT NULL,
        reaction_count INTEGER NOT NULL,
        created_at TEXT NOT NULL
      );
      CREATE TABLE analyses (
        id TEXT PRIMARY KEY,
        mechanism_id TEXT NOT NULL,
        engine_version TEXT NOT NULL,
        request_json TEXT NOT NULL,
        result_json TEXT NOT NULL,
        created_at TEXT NOT NULL
      );
      CREATE INDEX analyses_mechanism ON analyses (mechanism_id);
      CREATE TABLE records (
        kind TEXT NOT NULL,
        id TEXT NOT NULL,
        engine_version TEXT NOT NULL,
        body_json TEXT NOT NULL,
        created_at TEXT NOT NULL,
        PRIMARY KEY (kind, id)
      );
    `,
  },
];
