// The workbench: the stage chain across the top; part on the left, curves in the middle,
// the selected stage's settings on the right, its report under the curves.
import { Suspense, lazy } from 'react';
import { PartPanel } from './PartPanel';
import { StageChainPanel } from './StageChainPanel';
import { StageReportPanel } from './StageReportPanel';
import { StageSettingsPanel } from './StageSettingsPanel';

// The charts load with plotly, after the inputs and tables are on screen.
const CurvesPanel = lazy(() => import('./CurvesPanel').then((m) => ({ default: m.CurvesPanel })));

export function WorkbenchScreen() {
  return (
    <div className="workbench">
      <div className="area-chain">
        <StageChainPanel />
      </div>
      <div className="area-part">
        <PartPanel />
      </div>
      <div className="area-curves">
        <Suspense fallback={<section className="panel"><h2>Curves</h2><p className="stage-muted">Loading the charts…</p></section>}>
          <CurvesPanel />
        </Suspense>
        <StageReportPanel />
      </div>
      <div className="area-stage">
        <StageSettingsPanel />
      </div>
    </div>
  );
}
