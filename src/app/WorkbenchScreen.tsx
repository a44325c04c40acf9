// The workbench: the stage chain across the top; part on the left, curves in the middle,
// the selected stage's settings on the right, its report under the curves.
import { CurvesPanel } from './CurvesPanel';
import { PartPanel } from './PartPanel';
import { StageChainPanel } from './StageChainPanel';
import { StageReportPanel } from './StageReportPanel';
import { StageSettingsPanel } from './StageSettingsPanel';

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
        <CurvesPanel />
        <StageReportPanel />
      </div>
      <div className="area-stage">
        <StageSettingsPanel />
      </div>
    </div>
  );
}
