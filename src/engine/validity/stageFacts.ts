// The facts about one computed stage that the validity rules read. Gathered by the plan runner.
import type { MethodId } from '../methods/stageProblem';

export interface StageFacts {
  stageIndex: number;
  method: MethodId;
  forced: boolean;
  /** Whether the chosen method's own validity rule held. */
  methodValid: boolean;
  methodInvalidReason: string | null;
  biotLumped: number;
  biotSeries: number;
  fourierEnd: number;
  durationS: number;
  /** The h the Biot numbers use, W/m²K (largest convective h over the stage's surface range). */
  hWPerM2K: number;
  hIsConstant: boolean;
  radiationIncluded: boolean;
  /** Linearised radiation coefficient at the stage's starting surface temperature, W/m²K (with the material's emissivity when radiation is left out). */
  radiationCoefficientWPerM2K: number;
  emissivityUsed: number;
  surfaceStartK: number;
  mediumK: number;
  /** The medium looks like a liquid bath (high h or a library liquid). */
  liquidBath: boolean;
  /** The surface temperature range swept by the stage, K. */
  surfaceRangeK: { lowK: number; highK: number };
  /** Whether the method used holds properties constant, and at which temperature. */
  constantProperties: boolean;
  propertyTemperatureK: number;
  /** Largest relative spread (max - min)/max of k and of rho*cp over the stage's temperature range. */
  propertyVariation: { conductivity: number; heatCapacity: number };
  /** The error lumped capacitance makes here (exact centre-surface spread), K, where lumped was considered. */
  lumpedErrorK: number | null;
  lumpedAccuracyLimitK: number;
  oneTermErrorK: { centre: number; surface: number; mean: number } | null;
  crossCheck: { method: MethodId; refined: boolean; maxDifferenceK: number; allowedK: number } | null;
  energyRelativeError: number | null;
  timeSteps: number | null;
  endKind: 'duration' | 'point-temperature';
}
