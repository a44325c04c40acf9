// The screens of the shell, by hash route. A new screen (e.g. the stage sheet at #/sheet) adds one entry.
import type { ComponentType } from 'react';
import { WorkbenchScreen } from './WorkbenchScreen';

export interface ScreenEntry {
  /** The hash the screen lives at, e.g. "#/". */
  hash: string;
  title: string;
  Component: ComponentType;
}

export const SCREENS: readonly ScreenEntry[] = [{ hash: '#/', title: 'Workbench', Component: WorkbenchScreen }];

export function screenOfHash(hash: string): ScreenEntry {
  return SCREENS.find((s) => s.hash === hash) ?? SCREENS[0];
}
