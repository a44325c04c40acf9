// The shell: header (name, screens, edit history, units, a toolbar for other features),
// engine status, notices and the safety reminder, then the current screen.
import { Suspense, useState } from 'react';
import { UnitToggle } from '@/features/units/UnitToggle';
import { ExchangeToolbar } from '@/features/exchange/ExchangeToolbar';
import { TextField } from '@/features/part/TextField';
import { validateEdit } from '@/features/part/validateEdit';
import { planBodySchema } from '@/schema/planSchema';
import { AppStoreProvider } from '@/state/AppStoreProvider';
import { useAppStore } from '@/state/useAppStore';
import type { Workbench } from './startWorkbench';
import { EngineStatusBar } from './EngineStatusBar';
import { HistoryButtons } from './HistoryButtons';
import { SafetyNotice } from './SafetyNotice';
import { SCREENS, screenOfHash } from './screens';
import { useHashRoute } from './useHashRoute';
import { useUndoShortcuts } from './useUndoShortcuts';
import './workbench.css';

function PlanNameField() {
  const name = useAppStore((s) => s.document.main.name);
  const renamePlan = useAppStore((s) => s.renamePlan);
  return (
    <TextField
      label="Plan"
      value={name}
      onCommit={(next) => {
        const checked = validateEdit(planBodySchema.shape.name, next, 'Plan name');
        if (!checked.ok) return checked.message;
        renamePlan(checked.value);
        return null;
      }}
    />
  );
}

function UnitSwitch() {
  const system = useAppStore((s) => s.unitSystem);
  const setUnitSystem = useAppStore((s) => s.setUnitSystem);
  return <UnitToggle value={system} onChange={setUnitSystem} />;
}

function SaveProblem() {
  const problem = useAppStore((s) => s.saveProblem);
  return problem ? (
    <div className="notice" role="alert">
      <span>⚠ {problem}</span>
    </div>
  ) : null;
}

function Shell({ workbench }: { workbench: Workbench }) {
  useUndoShortcuts(workbench.store);
  const hash = useHashRoute();
  const screen = screenOfHash(hash);
  const [notice, setNotice] = useState(workbench.startNotice);
  return (
    <>
      <header className="app-header">
        <span className="brand">Coolstage</span>
        <div className="plan-name">
          <PlanNameField />
        </div>
        {SCREENS.length > 1 && (
          <nav aria-label="Screens">
            {SCREENS.map((s) => (
              <a key={s.hash} href={s.hash} aria-current={s === screen ? 'page' : undefined}>
                {s.title}
              </a>
            ))}
          </nav>
        )}
        <div className="toolbar" role="toolbar" aria-label="Workbench tools">
          <HistoryButtons />
          <UnitSwitch />
        </div>
      </header>
      <ExchangeToolbar />
      <EngineStatusBar onStop={() => workbench.engine.stop()} onRecompute={workbench.recompute} />
      <SaveProblem />
      {notice && (
        <div className="notice" role="alert">
          <span>{notice}</span>
          <button type="button" onClick={() => setNotice(null)}>
            Dismiss
          </button>
        </div>
      )}
      <SafetyNotice />
      <main>
        <h1 className="sr-only">{screen.title}</h1>
        <Suspense fallback={<p className="stage-muted">Opening {screen.title.toLowerCase()}…</p>}>
          <screen.Component />
        </Suspense>
      </main>
    </>
  );
}

export function App({ workbench }: { workbench: Workbench }) {
  return (
    <AppStoreProvider store={workbench.store}>
      <Shell workbench={workbench} />
    </AppStoreProvider>
  );
}
