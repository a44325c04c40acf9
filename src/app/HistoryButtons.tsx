// Undo and redo as buttons (the keys are in useUndoShortcuts).
import { useAppStore } from '@/state/useAppStore';

export function HistoryButtons() {
  const canUndo = useAppStore((s) => s.undoStack.length > 0);
  const canRedo = useAppStore((s) => s.redoStack.length > 0);
  const undo = useAppStore((s) => s.undo);
  const redo = useAppStore((s) => s.redo);
  return (
    <div className="button-row" role="group" aria-label="Edit history">
      <button type="button" onClick={undo} disabled={!canUndo} aria-keyshortcuts="Control+Z" title="Undo (Ctrl+Z)">
        ↶ Undo
      </button>
      <button type="button" onClick={redo} disabled={!canRedo} aria-keyshortcuts="Control+Shift+Z Control+Y" title="Redo (Ctrl+Shift+Z or Ctrl+Y)">
        ↷ Redo
      </button>
    </div>
  );
}
