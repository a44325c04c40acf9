// The built-in materials and media, in the order a picker shows them (media from mild to severe).
import type { MaterialEntry, MediumEntry } from './libraryEntrySchema';
import { aluminaCeramic } from './materials/aluminaCeramic';
import { aluminiumAlloy } from './materials/aluminiumAlloy';
import { austeniticStainlessSteel } from './materials/austeniticStainlessSteel';
import { leanMeatProduct } from './materials/leanMeatProduct';
import { lowAlloySteel } from './materials/lowAlloySteel';
import { plainCarbonSteel } from './materials/plainCarbonSteel';
import { pureCopper } from './materials/pureCopper';
import { sodaLimeGlass } from './materials/sodaLimeGlass';
import { agitatedOil } from './media/agitatedOil';
import { agitatedWater } from './media/agitatedWater';
import { brine } from './media/brine';
import { forcedAir } from './media/forcedAir';
import { polymerQuenchant } from './media/polymerQuenchant';
import { stillAir } from './media/stillAir';
import { stillOil } from './media/stillOil';
import { stillWater } from './media/stillWater';

export const BUILT_IN_MATERIALS: readonly MaterialEntry[] = [
  plainCarbonSteel,
  lowAlloySteel,
  austeniticStainlessSteel,
  aluminiumAlloy,
  pureCopper,
  sodaLimeGlass,
  aluminaCeramic,
  leanMeatProduct,
];

export const BUILT_IN_MEDIA: readonly MediumEntry[] = [stillAir, forcedAir, stillOil, agitatedOil, polymerQuenchant, stillWater, agitatedWater, brine];

export function builtInMaterial(id: string): MaterialEntry | undefined {
  return BUILT_IN_MATERIALS.find((m) => m.id === id);
}

export function builtInMedium(id: string): MediumEntry | undefined {
  return BUILT_IN_MEDIA.find((m) => m.id === id);
}
