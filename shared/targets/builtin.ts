import { CLUSTER_ROWS } from '@/shared/targets/builtin/clusters';
import { GALAXY_ROWS } from '@/shared/targets/builtin/galaxies';
import { MESSIER_ROWS } from '@/shared/targets/builtin/messier';
import { NEBULA_ROWS } from '@/shared/targets/builtin/nebulae';
import { PLANETARY_ROWS } from '@/shared/targets/builtin/planetary';
import { fromRow } from '@/shared/targets/builtin/row';
import type { CatalogueObject } from '@/shared/targets/schema';
import { hasDesignation } from '@/shared/targets/search';

/*
 * The built-in catalogue: all 110 Messier objects and popular NGC/IC imaging targets. Designations
 * and aliases follow `normaliseDesignation` ("M31", "NGC 224", "IC 434"); a Messier object is
 * designated by its Messier number with its NGC/IC number as an alias. Every position is checked
 * against OpenNGC (Mattia Verga, CC-BY-SA-4.0) within 2′ by tests/unit/targets-builtin.test.ts.
 */

/** The built-in catalogue objects, Messier first, then nebulae, planetaries, galaxies, clusters. */
export const BUILTIN_TARGETS: readonly CatalogueObject[] = [MESSIER_ROWS, NEBULA_ROWS, PLANETARY_ROWS, GALAXY_ROWS, CLUSTER_ROWS].flat().map(fromRow);

/** The built-in object with this designation or alias ("m 31", "NGC0224", "Andromeda" does not count). */
export function findBuiltinTarget(designation: string): CatalogueObject | undefined {
  return BUILTIN_TARGETS.find((o) => hasDesignation(o, designation));
}
