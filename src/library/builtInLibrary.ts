// The built-in materials and media, in the order a picker shows them.
import type { MaterialEntry, MediumEntry } from './libraryEntrySchema';
import { plainCarbonSteel } from './materials/plainCarbonSteel';
import { stillAir } from './media/stillAir';
import { stillWater } from './media/stillWater';

export const BUILT_IN_MATERIALS: readonly MaterialEntry[] = [plainCarbonSteel];

export const BUILT_IN_MEDIA: readonly MediumEntry[] = [stillAir, stillWater];

export function builtInMaterial(id: string): MaterialEntry | undefined {
  return BUILT_IN_MATERIALS.find((m) => m.id === id);
}

export function builtInMedium(id: string): MediumEntry | undefined {
  return BUILT_IN_MEDIA.find((m) => m.id === id);
}
