// Variants of the main plan: copy, edit, rename, remove, promote; and the stage sheet's title block.
// All of them are document edits through commitDocument, so undo and redo cover them.
import type { StateCreator } from 'zustand/vanilla';
import type { PlanK } from '@/schema/planSchema';
import { EMPTY_SHEET_META, type PlanDocument, type PlanSheetMeta, type PlanVariant } from '@/schema/planDocument';
import { MAX_VARIANTS } from '@/schema/planFileSchema';
import type { AppState } from './appState';

export interface VariantsSlice {
  /** Copy the main plan (or another variant) into a new variant; returns its id, or null at the limit. */
  addVariant(fromId?: string): string | null;
  renameVariant(id: string, name: string): void;
  removeVariant(id: string): void;
  editVariant(id: string, recipe: (plan: PlanK) => PlanK, mergeKey?: string): void;
  /** The variant becomes the main plan; the old main plan is kept as a variant in its place. */
  promoteVariant(id: string): void;
  setSheetMeta(patch: Partial<PlanSheetMeta>): void;
}

/** The smallest "vN" not taken. */
export function freeVariantId(variants: readonly PlanVariant[]): string {
  const taken = new Set(variants.map((v) => v.id));
  let n = 1;
  while (taken.has(`v${n}`)) n += 1;
  return `v${n}`;
}

/** Short names read best in legends and table headers: "Variant 1", "Variant 2"... */
function freeVariantName(variants: readonly PlanVariant[]): string {
  const taken = new Set(variants.map((v) => v.name));
  let n = variants.length + 1;
  while (taken.has(`Variant ${n}`)) n += 1;
  return `Variant ${n}`;
}

export const createVariantsSlice: StateCreator<AppState, [], [], VariantsSlice> = (_set, get) => {
  const commit = (recipe: (d: PlanDocument) => PlanDocument, mergeKey?: string) => {
    const { document, commitDocument } = get();
    commitDocument(recipe(document), mergeKey);
  };
  const mapVariant = (id: string, f: (v: PlanVariant) => PlanVariant) => (d: PlanDocument) => ({ ...d, variants: d.variants.map((v) => (v.id === id ? f(v) : v)) });

  return {
    addVariant(fromId) {
      const { document } = get();
      if (document.variants.length >= MAX_VARIANTS) return null;
      const source = document.variants.find((v) => v.id === fromId)?.plan ?? document.main;
      const id = freeVariantId(document.variants);
      const name = freeVariantName(document.variants);
      commit((d) => ({ ...d, variants: [...d.variants, { id, name, plan: { ...structuredClone(source), name } }] }));
      return id;
    },
    renameVariant(id, name) {
      commit(mapVariant(id, (v) => ({ ...v, name, plan: { ...v.plan, name } })), `variant.${id}.name`);
    },
    removeVariant(id) {
      commit((d) => ({ ...d, variants: d.variants.filter((v) => v.id !== id) }));
    },
    editVariant(id, recipe, mergeKey) {
      commit(mapVariant(id, (v) => ({ ...v, plan: recipe(v.plan) })), mergeKey);
    },
    promoteVariant(id) {
      const { document } = get();
      const chosen = document.variants.find((v) => v.id === id);
      if (!chosen) return;
      const previous: PlanVariant = { id: freeVariantId(document.variants), name: document.main.name, plan: document.main };
      commit((d) => ({ ...d, main: chosen.plan, variants: d.variants.map((v) => (v.id === id ? previous : v)) }));
    },
    setSheetMeta(patch) {
      const keys = Object.keys(patch).sort().join(',');
      commit((d) => ({ ...d, sheet: { ...(d.sheet ?? EMPTY_SHEET_META), ...patch } }), `sheet.${keys}`);
    },
  };
};
