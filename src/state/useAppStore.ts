// Read the store with a narrow selector; components re-render only when the selected value changes.
import { useContext } from 'react';
import { useStore } from 'zustand';
import type { AppState } from './appState';
import { AppStoreContext } from './AppStoreProvider';
import type { AppStore } from './createAppStore';

export function useAppStoreApi(): AppStore {
  const store = useContext(AppStoreContext);
  if (!store) throw new Error('useAppStore needs an AppStoreProvider above it');
  return store;
}

export function useAppStore<T>(selector: (state: AppState) => T): T {
  return useStore(useAppStoreApi(), selector);
}
