// The whole workbench state: one store built from slices (one file each).
// A later slice (variants) adds itself here and in createAppStore.
import type { DocumentSlice } from './documentSlice';
import type { PlanEditSlice } from './planEditSlice';
import type { ResultsSlice } from './resultsSlice';
import type { ViewSlice } from './viewSlice';
import type { VariantsSlice } from './variantsSlice';
import type { UserLibrarySlice } from './userLibrarySlice';

export type AppState = DocumentSlice & PlanEditSlice & ResultsSlice & ViewSlice & VariantsSlice & UserLibrarySlice;
