// The two unit systems the workbench displays: SI (degC, mm, W) and US customary (degF, in, Btu).
// Inside the app every number is SI (kelvin, metres, seconds, watts); a unit system only changes what is shown and typed.

export type UnitSystem = 'SI' | 'US';

export const UNIT_SYSTEMS: readonly { id: UnitSystem; label: string; title: string }[] = [
  { id: 'SI', label: 'SI', title: 'SI units: °C, mm, W/(m²·K), J' },
  { id: 'US', label: 'US', title: 'US customary units: °F, in, Btu/(h·ft²·°F), Btu' },
];
