/** Every section catalogue shipped with the service, as one list, and a registry built from it. */

import type { SectionEntry } from './section-entry.js';
import { SectionCatalogue } from './section-catalogue.js';
import { PIPES } from './sections/asme-b36-pipe.js';
import { W_SHAPES } from './sections/astm-a6-w.js';
import { CHS_SECTIONS } from './sections/en-10219-chs.js';
import { RHS_SECTIONS } from './sections/en-10219-rhs.js';
import { SHS_SECTIONS } from './sections/en-10219-shs.js';
import { HEA_SECTIONS } from './sections/en-10365-hea.js';
import { HEB_SECTIONS } from './sections/en-10365-heb.js';
import { IPE_SECTIONS } from './sections/en-10365-ipe.js';
import { FLAT_BARS, ROUND_BARS } from './sections/metric-bars.js';

/** The name the embedded sections go by in messages (a duplicate, say). */
export const EMBEDDED_SECTIONS_NAME = 'the embedded section catalogues';

export function embeddedSections(): readonly SectionEntry[] {
  return [
    ...IPE_SECTIONS,
    ...HEA_SECTIONS,
    ...HEB_SECTIONS,
    ...SHS_SECTIONS,
    ...RHS_SECTIONS,
    ...CHS_SECTIONS,
    ...ROUND_BARS,
    ...FLAT_BARS,
    ...W_SHAPES,
    ...PIPES,
  ];
}

/** A registry holding the embedded sections only; company catalogues are added to it with add(). */
export function embeddedSectionCatalogue(): SectionCatalogue {
  return new SectionCatalogue([{ name: EMBEDDED_SECTIONS_NAME, entries: embeddedSections() }]);
}
