// Edits of the main plan: the part and the stage chain. Each one is a single commit (one undo step,
// or merged with the previous edit of the same field while typing).
import type { StateCreator } from 'zustand/vanilla';
import type { Material, PlanK, Shape, Stage } from '@/schema/planSchema';
import type { AppState } from './appState';
import { newStageAfter } from './newStageAfter';

/** The schema's upper limit on stages. */
export const MAX_STAGES = 50;

export interface PlanEditSlice {
  editMainPlan(recipe: (plan: PlanK) => PlanK, mergeKey?: string): void;
  renamePlan(name: string): void;
  setShape(shape: Shape, mergeKey?: string): void;
  setMaterial(material: Material, mergeKey?: string): void;
  setInitialTemperatureK(temperatureK: number): void;
  updateStage(index: number, stage: Stage, mergeKey?: string): void;
  addStage(): void;
  duplicateStage(index: number): void;
  removeStage(index: number): void;
  moveStage(from: number, to: number): void;
}

export const createPlanEditSlice: StateCreator<AppState, [], [], PlanEditSlice> = (set, get) => {
  const edit = (recipe: (plan: PlanK) => PlanK, mergeKey?: string) => {
    const { document, commitDocument } = get();
    commitDocument({ ...document, main: recipe(document.main) }, mergeKey);
  };
  const withStages = (plan: PlanK, stages: Stage[]): PlanK => ({ ...plan, stages });

  return {
    editMainPlan: edit,
    renamePlan: (name) => edit((p) => ({ ...p, name }), 'plan.name'),
    setShape: (shape, mergeKey) => edit((p) => ({ ...p, part: { ...p.part, shape } }), mergeKey),
    setMaterial: (material, mergeKey) => edit((p) => ({ ...p, part: { ...p.part, material } }), mergeKey),
    setInitialTemperatureK: (temperatureK) => edit((p) => ({ ...p, initialTemperature: temperatureK }), 'plan.initialTemperature'),
    updateStage: (index, stage, mergeKey) => edit((p) => withStages(p, p.stages.map((s, i) => (i === index ? stage : s))), mergeKey),
    addStage() {
      const { document, selectedStageIndex } = get();
      const stages = document.main.stages;
      if (stages.length >= MAX_STAGES) return;
      const at = Math.min(selectedStageIndex, stages.length - 1) + 1;
      edit((p) => withStages(p, [...stages.slice(0, at), newStageAfter(stages[at - 1], stages.length + 1), ...stages.slice(at)]));
      set({ selectedStageIndex: at });
    },
    duplicateStage(index) {
      const stages = get().document.main.stages;
      if (stages.length >= MAX_STAGES || !stages[index]) return;
      const copy: Stage = { ...stages[index], name: `${stages[index].name} (copy)`.slice(0, 120) };
      edit((p) => withStages(p, [...stages.slice(0, index + 1), copy, ...stages.slice(index + 1)]));
      set({ selectedStageIndex: index + 1 });
    },
    removeStage(index) {
      const stages = get().document.main.stages;
      if (stages.length <= 1 || !stages[index]) return;
      edit((p) => withStages(p, stages.filter((_, i) => i !== index)));
      set({ selectedStageIndex: Math.max(0, Math.min(index, stages.length - 2)) });
    },
    moveStage(from, to) {
      const stages = get().document.main.stages;
      if (from === to || !stages[from] || to < 0 || to >= stages.length) return;
      const next = stages.slice();
      const [moved] = next.splice(from, 1);
      next.splice(to, 0, moved);
      edit((p) => withStages(p, next));
      set({ selectedStageIndex: to });
    },
  };
};
