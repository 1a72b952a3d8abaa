/**
 * A small mathjs instance holding only units and fractions. Importing all of mathjs adds
 * about 180 KB (gzip) to any client chunk that reaches it; `create` with the two dependency
 * sets we use keeps the engine light.
 */
import { create, fractionDependencies, unitDependencies, type FactoryFunctionMap } from 'mathjs';

// mathjs types each dependency set as possibly undefined; both exist in mathjs 15.
const factories: FactoryFunctionMap = { unitDependencies, fractionDependencies } as FactoryFunctionMap;

export const unitMath = create(factories);
