// General safety cautions printed on a stage sheet, as data. They remind; they do not replace the
// site's procedures, local codes or the judgement of qualified people.

export interface Caution {
  id: string;
  topic: string;
  text: string;
}

export const HOT_PARTS_CAUTION: Caution = {
  id: 'hot-parts',
  topic: 'Hot parts and burns',
  text: 'Parts stay dangerously hot long after they stop glowing. Mark and fence hot parts, handle them only with suitable tongs, gloves and face protection, and never judge temperature by look or touch.',
};

export const QUENCH_OIL_FIRE_CAUTION: Caution = {
  id: 'quench-oil-fire',
  topic: 'Quench-oil fire and flash point',
  text: 'Quench oil can ignite. Keep the bath well below the flash point given by the oil supplier, size each load so its heat cannot lift the oil towards that point, submerge the load fully and quickly, and keep the tank cover and the extinguishing means the site specifies (never water) ready.',
};

export const WATER_IN_OIL_CAUTION: Caution = {
  id: 'water-in-oil',
  topic: 'Water in oil',
  text: 'Even a little water in a hot oil bath turns to steam when the load enters: the oil can boil over, spray and catch fire. Keep water, wet parts and wet fixtures out of oil tanks.',
};

export const STEAM_CAUTION: Caution = {
  id: 'steam',
  topic: 'Steam and splashing',
  text: 'Water-based quenches flash to steam at the part: steam and splashed liquid burn. Lower loads steadily, keep faces and hands clear of the tank, and wear the protection the site requires.',
};

export const CRACKING_CAUTION: Caution = {
  id: 'cracking',
  topic: 'Cracking and distortion',
  text: 'A severe or uneven quench can crack or distort a part, especially high-hardenability steels, sharp corners, holes and sudden changes of section. Have the grade, the geometry and the quench checked by qualified people; temper promptly where the process calls for it.',
};

export const HANDLING_CAUTION: Caution = {
  id: 'handling',
  topic: 'Handling and lifting',
  text: 'Loads, baskets and fixtures are heavy and hot. Use rated lifting gear and fixtures, plan the transfer path before the part leaves the furnace, and keep people out of it.',
};

export const DEFER_CAUTION: Caution = {
  id: 'defer',
  topic: 'Procedures and codes',
  text: 'These results are estimates for planning. Follow the site procedures, local codes and the advice of qualified people; they take precedence over anything this tool shows.',
};

/** The cautions every stage sheet prints, in order. */
export const STAGE_SHEET_CAUTIONS: readonly Caution[] = [
  HOT_PARTS_CAUTION,
  QUENCH_OIL_FIRE_CAUTION,
  WATER_IN_OIL_CAUTION,
  STEAM_CAUTION,
  CRACKING_CAUTION,
  HANDLING_CAUTION,
  DEFER_CAUTION,
];
