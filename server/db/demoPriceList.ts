/**
 * The demo workshop's price list. Every price here is INVENTED for the demo — plausible-looking
 * round figures, not quotes from any dealer or market survey — so the Materials page has
 * something to cost with. Seeded only when the workshop has no price list, so an owner's edits
 * are never overwritten.
 */
import type { Sequelize } from 'sequelize';
import type { PriceList } from '../../shared/materials/priceList.ts';
import { modelsFor } from './models/index.ts';

/** The invented list: lumber per board foot, sheets per sheet, hardware and finish per unit (cents). */
export const DEMO_PRICE_LIST: PriceList = {
  currency: 'USD',
  items: [
    { kind: 'lumber', speciesId: 'white-oak', quarters: 4, pricePerBoardFootCents: 925 },
    { kind: 'lumber', speciesId: 'white-oak', quarters: 5, pricePerBoardFootCents: 1050 },
    { kind: 'lumber', speciesId: 'white-oak', quarters: 8, pricePerBoardFootCents: 1275 },
    { kind: 'lumber', speciesId: 'white-oak', quarters: 12, pricePerBoardFootCents: 1600 },
    { kind: 'lumber', speciesId: 'black-cherry', quarters: 4, pricePerBoardFootCents: 875 },
    { kind: 'lumber', speciesId: 'black-cherry', quarters: 5, pricePerBoardFootCents: 975 },
    { kind: 'lumber', speciesId: 'black-cherry', quarters: 8, pricePerBoardFootCents: 1150 },
    { kind: 'lumber', speciesId: 'soft-maple', quarters: 4, pricePerBoardFootCents: 550 },
    { kind: 'lumber', speciesId: 'soft-maple', quarters: 5, pricePerBoardFootCents: 625 },
    { kind: 'lumber', speciesId: 'soft-maple', quarters: 8, pricePerBoardFootCents: 725 },
    { kind: 'lumber', speciesId: 'hard-maple', quarters: 4, pricePerBoardFootCents: 675 },
    { kind: 'lumber', speciesId: 'hard-maple', quarters: 5, pricePerBoardFootCents: 750 },
    { kind: 'lumber', speciesId: 'hard-maple', quarters: 8, pricePerBoardFootCents: 875 },
    { kind: 'lumber', speciesId: 'yellow-poplar', quarters: 4, pricePerBoardFootCents: 425 },
    { kind: 'sheet', sheetId: 'hardwood-plywood-1/4', pricePerSheetCents: 5200 },
    { kind: 'sheet', sheetId: 'hardwood-plywood-1/2', pricePerSheetCents: 7400 },
    { kind: 'sheet', sheetId: 'hardwood-plywood-3/4', pricePerSheetCents: 9800 },
    { kind: 'sheet', sheetId: 'mdf-1/4', pricePerSheetCents: 2400 },
    { kind: 'sheet', sheetId: 'mdf-3/4', pricePerSheetCents: 4600 },
    { kind: 'hardware', itemId: 'lid-support-hinge', name: 'Lid-support hinge, torque rated', unit: 'each', pricePerUnitCents: 3450 },
    { kind: 'hardware', itemId: 'drawer-slide-18', name: 'Drawer slide, 18 in full extension', unit: 'pair', pricePerUnitCents: 1890 },
    { kind: 'hardware', itemId: 'knob', name: 'Wooden knob', unit: 'each', pricePerUnitCents: 450 },
    { kind: 'hardware', itemId: 'anti-tip-kit', name: 'Anti-tip restraint kit', unit: 'each', pricePerUnitCents: 1200 },
    { kind: 'finish', itemId: 'oil-varnish-quart', name: 'Oil-based varnish', unit: 'quart', pricePerUnitCents: 2600 },
    { kind: 'finish', itemId: 'milk-paint-quart', name: 'Milk paint', unit: 'quart', pricePerUnitCents: 3100 },
  ],
};

/** Gives `workshopId` the demo price list unless it has one; returns true when it saved it. */
export async function seedDemoPriceList(sequelize: Sequelize, workshopId: string, ownerId: string): Promise<boolean> {
  const models = modelsFor(sequelize);
  const [, created] = await models.PriceList.findOrCreate({
    where: { workshopId },
    defaults: { workshopId, currency: DEMO_PRICE_LIST.currency, items: DEMO_PRICE_LIST.items, updatedBy: ownerId },
  });
  return created;
}
