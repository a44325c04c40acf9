// The screens of the shell, by hash route. A new screen adds one entry. Screens other than the
// workbench load on first visit, so the first screen ships less JavaScript.
import { lazy, type ComponentType } from 'react';
import { WorkbenchScreen } from './WorkbenchScreen';

export interface ScreenEntry {
  /** The hash the screen lives at, e.g. "#/". */
  hash: string;
  title: string;
  Component: ComponentType;
}

const VariantsScreen = lazy(() => import('@/features/variants/VariantsScreen').then((m) => ({ default: m.VariantsScreen })));
const LibraryScreen = lazy(() => import('./LibraryScreen').then((m) => ({ default: m.LibraryScreen })));
const SheetPage = lazy(() => import('@/features/sheet/SheetPage').then((m) => ({ default: m.SheetPage })));

export const SCREENS: readonly ScreenEntry[] = [
  { hash: '#/', title: 'Workbench', Component: WorkbenchScreen },
  { hash: '#/variants', title: 'Variants', Component: VariantsScreen },
  { hash: '#/sheet', title: 'Stage sheet', Component: SheetPage },
  { hash: '#/library', title: 'My library', Component: LibraryScreen },
];

export function screenOfHash(hash: string): ScreenEntry {
  return SCREENS.find((s) => s.hash === hash) ?? SCREENS[0];
}
