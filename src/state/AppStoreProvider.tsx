// Hands the one store to the component tree; tests give each render a store of their own.
import { createContext, type ReactNode } from 'react';
import type { AppStore } from './createAppStore';

export const AppStoreContext = createContext<AppStore | null>(null);

export function AppStoreProvider({ store, children }: { store: AppStore; children: ReactNode }) {
  return <AppStoreContext.Provider value={store}>{children}</AppStoreContext.Provider>;
}
