/** Every material catalogue shipped with the service, as one list, and a registry built from it. */

import type { MaterialEntry } from './material-entry.js';
import { MaterialCatalogue } from './material-catalogue.js';
import { AISI_CARBON_BAR_GRADES } from './materials/aisi-carbon-bar.js';
import { ALUMINIUM_GRADES } from './materials/aluminium-en-573.js';
import { ASTM_STRUCTURAL_GRADES } from './materials/astm-structural.js';
import { CAST_IRON_GRADES } from './materials/cast-iron.js';
import { EN_10025_2_GRADES } from './materials/en-10025-2.js';
import { STAINLESS_GRADES } from './materials/stainless-en-10088.js';

/** The name the embedded materials go by in messages (a duplicate, say). */
export const EMBEDDED_MATERIALS_NAME = 'the embedded material catalogue';

export function embeddedMaterials(): readonly MaterialEntry[] {
  return [
    ...EN_10025_2_GRADES,
    ...ASTM_STRUCTURAL_GRADES,
    ...ALUMINIUM_GRADES,
    ...AISI_CARBON_BAR_GRADES,
    ...STAINLESS_GRADES,
    ...CAST_IRON_GRADES,
  ];
}

/** A registry holding the embedded materials only; company catalogues are added to it with add(). */
export function embeddedMaterialCatalogue(): MaterialCatalogue {
  return new MaterialCatalogue(embeddedMaterials(), EMBEDDED_MATERIALS_NAME);
}
