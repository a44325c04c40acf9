// Materials and media the user saved to their own library (beside the built-in ones). Not part of
// the plan document and not undoable; kept in this browser by the autosave.
import type { StateCreator } from 'zustand/vanilla';
import type { MaterialEntry, MediumEntry } from '@/library/libraryEntrySchema';
import type { AppState } from './appState';

export interface UserLibrary {
  materials: MaterialEntry[];
  media: MediumEntry[];
}

export interface UserLibrarySlice {
  userLibrary: UserLibrary;
  saveUserMaterial(entry: MaterialEntry): void;
  removeUserMaterial(id: string): void;
  saveUserMedium(entry: MediumEntry): void;
  removeUserMedium(id: string): void;
}

export const createUserLibrarySlice =
  (initial: UserLibrary): StateCreator<AppState, [], [], UserLibrarySlice> =>
  (set, get) => ({
    userLibrary: initial,
    saveUserMaterial(entry) {
      const { materials, media } = get().userLibrary;
      set({ userLibrary: { media, materials: [...materials.filter((m) => m.id !== entry.id), entry] } });
    },
    removeUserMaterial(id) {
      const { materials, media } = get().userLibrary;
      set({ userLibrary: { media, materials: materials.filter((m) => m.id !== id) } });
    },
    saveUserMedium(entry) {
      const { materials, media } = get().userLibrary;
      set({ userLibrary: { materials, media: [...media.filter((m) => m.id !== entry.id), entry] } });
    },
    removeUserMedium(id) {
      const { materials, media } = get().userLibrary;
      set({ userLibrary: { materials, media: media.filter((m) => m.id !== id) } });
    },
  });
