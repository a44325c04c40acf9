// The stage the "add stage" button inserts: an air hold at the medium temperature of the stage
// before it. The h is an invented demo value of the order of still air (common practice); the
// user sets the real one.
import type { Stage } from '@/schema/planSchema';

const NEW_STAGE_H_W_PER_M2K = 10;
const NEW_STAGE_DURATION_S = 600;
const NEW_STAGE_MEDIUM_TEMPERATURE_K = 293.15;

export function newStageAfter(previous: Stage | undefined, number: number): Stage {
  return {
    name: `Stage ${number}`,
    medium: {
      name: 'still air',
      temperature: previous?.medium.temperature ?? NEW_STAGE_MEDIUM_TEMPERATURE_K,
      heatTransfer: { kind: 'constant', hWPerM2K: NEW_STAGE_H_W_PER_M2K },
    },
    end: { kind: 'duration', seconds: NEW_STAGE_DURATION_S },
    method: 'auto',
  };
}
