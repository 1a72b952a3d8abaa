/** Lengths: one internal unit (mm), parsed from and formatted to what a maker types and reads. */
export * from './length.ts';
export * from './parse.ts';
export * from './format.ts';
export * from './dual.ts';
export * from './feetInches.ts';
