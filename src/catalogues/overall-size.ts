/**
 * Overall depth (along y) and width (along z) of a section from its dimensions, m, for filtering a
 * catalogue by the room a member may take. A 'custom' section has them only if it gives them;
 * otherwise the result is undefined, and a catalogue listing with a size limit leaves it out (its
 * fit cannot be shown).
 */

import type { SectionDimensions } from '../engine/sections/dimensions.js';

export function overallDepth(dimensions: SectionDimensions): number | undefined {
  switch (dimensions.shape) {
    case 'rectangle':
    case 'box':
    case 'i-section':
    case 'channel':
    case 'tee':
      return dimensions.depth;
    case 'round':
      return dimensions.diameter;
    case 'tube':
      return dimensions.outerDiameter;
    case 'angle':
      return dimensions.legY;
    case 'custom':
      return dimensions.depth;
  }
}

export function overallWidth(dimensions: SectionDimensions): number | undefined {
  switch (dimensions.shape) {
    case 'rectangle':
    case 'box':
      return dimensions.width;
    case 'i-section':
    case 'channel':
    case 'tee':
      return dimensions.flangeWidth;
    case 'round':
      return dimensions.diameter;
    case 'tube':
      return dimensions.outerDiameter;
    case 'angle':
      return dimensions.legZ;
    case 'custom':
      return dimensions.width;
  }
}
