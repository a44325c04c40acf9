// Ctrl+Z undoes, Ctrl+Shift+Z and Ctrl+Y redo (Cmd on macOS), anywhere in the workbench: fields
// commit as the user types, so the workbench's history is the one that matters.
import { useEffect } from 'react';
import type { AppStore } from '@/state/createAppStore';

export function undoShortcutOf(e: Pick<KeyboardEvent, 'key' | 'ctrlKey' | 'metaKey' | 'shiftKey' | 'altKey'>): 'undo' | 'redo' | null {
  if (!(e.ctrlKey || e.metaKey) || e.altKey) return null;
  const key = e.key.toLowerCase();
  if (key === 'z') return e.shiftKey ? 'redo' : 'undo';
  if (key === 'y' && !e.shiftKey) return 'redo';
  return null;
}

export function useUndoShortcuts(store: AppStore): void {
  useEffect(() => {
    const onKeyDown = (e: KeyboardEvent) => {
      const action = undoShortcutOf(e);
      if (!action) return;
      e.preventDefault();
      if (action === 'undo') store.getState().undo();
      else store.getState().redo();
    };
    window.addEventListener('keydown', onKeyDown);
    return () => window.removeEventListener('keydown', onKeyDown);
  }, [store]);
}
