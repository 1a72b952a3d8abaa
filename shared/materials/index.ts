/** Materials: takeoff (boards and sheets laid out), price list, cost and shopping list. */
export * from './money.ts';
export * from './priceList.ts';
export * from './priceListCsv.ts';
export * from './partsForLayout.ts';
export * from './takeoff.ts';
export * from './cost.ts';
export * from './shoppingList.ts';
export * from './stockSettings.ts';
