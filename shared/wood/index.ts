/** Wood science: species and sheet goods with sources, moisture content, movement and the rules built on it. */
export * from './source.ts';
export * from './density.ts';
export * from './species.ts';
export * from './sheetGoods.ts';
export * from './resolve.ts';
export * from './emc.ts';
export * from './climate.ts';
export * from './movement.ts';
export * from './float.ts';
export * from './slots.ts';
export * from './glueUp.ts';
