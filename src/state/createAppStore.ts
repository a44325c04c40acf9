// One vanilla zustand store, so that the worker client and the autosave write to it outside React.
import { createStore, type StoreApi } from 'zustand/vanilla';
import type { PlanDocument } from '@/schema/planDocument';
import type { AppState } from './appState';
import { createDocumentSlice } from './documentSlice';
import { createPlanEditSlice } from './planEditSlice';
import { createResultsSlice } from './resultsSlice';
import type { UnitSystem } from '@/features/units/unitSystem';
import { createViewSlice } from './viewSlice';
import { createVariantsSlice } from './variantsSlice';
import { createUserLibrarySlice, type UserLibrary } from './userLibrarySlice';

export type AppStore = StoreApi<AppState>;

export function createAppStore(initial: { document: PlanDocument; unitSystem?: UnitSystem; userLibrary?: UserLibrary; nowMs?: () => number }): AppStore {
  return createStore<AppState>()((...a) => ({
    ...createDocumentSlice(initial.document, initial.nowMs)(...a),
    ...createPlanEditSlice(...a),
    ...createResultsSlice(...a),
    ...createViewSlice(initial.unitSystem ?? 'si')(...a),
    ...createVariantsSlice(...a),
    ...createUserLibrarySlice(initial.userLibrary ?? { materials: [], media: [] })(...a),
  }));
}
