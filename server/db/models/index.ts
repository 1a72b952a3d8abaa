/**
 * The models bound to one Sequelize instance. Defined per instance (not as static classes) so
 * several apps — a test's restarted server, the fault test's second database — can live in one
 * process.
 */
import type { Sequelize } from 'sequelize';
import { defineApproval } from './Approval.ts';
import { defineComment } from './Comment.ts';
import { defineDesign } from './Design.ts';
import { defineInvitation } from './Invitation.ts';
import { defineMembership } from './Membership.ts';
import { definePasswordReset } from './PasswordReset.ts';
import { definePriceList } from './PriceList.ts';
import { defineRevision } from './Revision.ts';
import { defineUser } from './User.ts';
import { defineWorkshop } from './Workshop.ts';
import { defineWorkshopStock } from './WorkshopStock.ts';

function defineModels(sequelize: Sequelize) {
  return {
    User: defineUser(sequelize),
    Workshop: defineWorkshop(sequelize),
    Membership: defineMembership(sequelize),
    Invitation: defineInvitation(sequelize),
    PasswordReset: definePasswordReset(sequelize),
    Design: defineDesign(sequelize),
    Revision: defineRevision(sequelize),
    Comment: defineComment(sequelize),
    Approval: defineApproval(sequelize),
    PriceList: definePriceList(sequelize),
    WorkshopStock: defineWorkshopStock(sequelize),
  };
}

export type Models = ReturnType<typeof defineModels>;

const bound = new WeakMap<Sequelize, Models>();

/** The models for `sequelize`, defined on first use. */
export function modelsFor(sequelize: Sequelize): Models {
  let models = bound.get(sequelize);
  if (!models) {
    models = defineModels(sequelize);
    bound.set(sequelize, models);
  }
  return models;
}
