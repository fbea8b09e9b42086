import { create, createUnitDependencies, unitDependencies, type FactoryFunctionMap } from 'mathjs';

/** mathjs's typings mark dependency maps as possibly undefined; fail loudly if one is missing. */
function dependencyMap(map: FactoryFunctionMap | undefined, name: string): FactoryFunctionMap {
  if (map === undefined)
    throw new Error(`mathjs does not export ${name}; check the mathjs version.`);
  return map;
}

/**
 * A private mathjs instance holding only unit parsing, so that the shared bundle stays small and
 * the units we add (`gpm`, `gph`, `lpm`, `lph`) never leak into another mathjs instance.
 */
export const unitMath = create({
  unitDependencies: dependencyMap(unitDependencies, 'unitDependencies'),
  createUnitDependencies: dependencyMap(createUnitDependencies, 'createUnitDependencies'),
});

unitMath.createUnit('gpm', '1 gal/min');
unitMath.createUnit('gph', '1 gal/h');
unitMath.createUnit('lpm', '1 L/min');
unitMath.createUnit('lph', '1 L/h');
