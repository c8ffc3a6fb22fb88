/**
 * Section properties from a shape's dimensions: the one entry point the rest of the engine and the
 * API call. Each shape lives in its own file; impossible geometry throws
 * EngineError('impossible-geometry') with the path ['section', field].
 *
 * @example sectionProperties({ shape: 'round', diameter: 0.02 }).area // 3.1416e-4
 */

import { angleProperties } from './angle.js';
import { boxProperties } from './box.js';
import { channelProperties } from './channel.js';
import { customProperties } from './custom.js';
import type { SectionDimensions } from './dimensions.js';
import { iSectionProperties } from './i-section.js';
import { rectangleProperties } from './rectangle.js';
import { roundProperties } from './round.js';
import type { SectionProperties } from './section-properties.js';
import { teeProperties } from './tee.js';
import { tubeProperties } from './tube.js';

export function sectionProperties(dimensions: SectionDimensions): SectionProperties {
  switch (dimensions.shape) {
    case 'rectangle':
      return rectangleProperties(dimensions);
    case 'round':
      return roundProperties(dimensions);
    case 'tube':
      return tubeProperties(dimensions);
    case 'box':
      return boxProperties(dimensions);
    case 'i-section':
      return iSectionProperties(dimensions);
    case 'channel':
      return channelProperties(dimensions);
    case 'tee':
      return teeProperties(dimensions);
    case 'angle':
      return angleProperties(dimensions);
    case 'custom':
      return customProperties(dimensions);
  }
}
