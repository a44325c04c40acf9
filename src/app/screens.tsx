// The screens of the shell, by hash route. A new screen (e.g. the stage sheet at #/sheet) adds one entry.
import type { ComponentType } from 'react';
import { WorkbenchScreen } from './WorkbenchScreen';
import { VariantsScreen } from '@/features/variants/VariantsScreen';
import { SheetPage } from '@/features/sheet/SheetPage';

export interface ScreenEntry {
  /** The hash the screen lives at, e.g. "#/". */
  hash: string;
  title: string;
  Component: ComponentType;
}

export const SCREENS: readonly ScreenEntry[] = [
  { hash: '#/', title: 'Workbench', Component: WorkbenchScreen },
  { hash: '#/variants', title: 'Variants', Component: VariantsScreen },
  { hash: '#/sheet', title: 'Stage sheet', Component: SheetPage },
];

export function screenOfHash(hash: string): ScreenEntry {
  return SCREENS.find((s) => s.hash === hash) ?? SCREENS[0];
}
