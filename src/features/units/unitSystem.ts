// The two unit systems the workbench displays: SI (degC, mm, W) and US customary (degF, in, Btu).
// The ids match the store's view slice (src/state/viewSlice.ts).
// Inside the app every number is SI (kelvin, metres, seconds, watts); a unit system only changes what is shown and typed.

export type UnitSystem = 'si' | 'us';

export const UNIT_SYSTEMS: readonly { id: UnitSystem; label: string; title: string }[] = [
  { id: 'si', label: 'SI', title: 'SI units: °C, mm, W/(m²·K), J' },
  { id: 'us', label: 'US', title: 'US customary units: °F, in, Btu/(h·ft²·°F), Btu' },
];
