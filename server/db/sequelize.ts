import { Sequelize } from 'sequelize';
import pg from 'pg';

// Return BIGINT counts and NUMERIC prices as JavaScript numbers where they fit.
pg.types.setTypeParser(20, (value) => Number(value));

/**
 * One Sequelize instance per process. Short connect and acquire timeouts make a database
 * outage answer quickly with 503 instead of hanging the request.
 */
export function createSequelize(databaseUrl: string, timeoutMs = 3000): Sequelize {
  return new Sequelize(databaseUrl, {
    dialect: 'postgres',
    logging: false,
    pool: { max: 20, min: 0, acquire: timeoutMs, idle: 10_000, evict: 1_000 },
    dialectOptions: {
      connectionTimeoutMillis: timeoutMs,
      statement_timeout: 15_000,
      application_name: 'casewright',
    },
    retry: { max: 0 },
  });
}
