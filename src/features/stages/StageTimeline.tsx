// The stage chain as a row of blocks whose widths follow the computed durations (equal widths
// until results arrive, or when a stage could not be computed). A listbox: arrows select, Alt+arrows move the selected stage, Home/End
// jump; blocks can also be dragged. The buttons act on the selected stage.
import { useEffect, useRef, useState, type KeyboardEvent } from 'react';
import type { Stage } from '@/schema/planSchema';
import type { StageResult, FailedStage } from '@/engine/plan/planResult';
import type { UnitSystem } from '@/features/units/unitSystem';
import { StageBlock } from './StageBlock';

export interface StageTimelineProps {
  stages: Stage[];
  results: StageResult[] | null;
  failure: FailedStage | null;
  /** True while the results are for an older version of the plan. */
  stale: boolean;
  selectedIndex: number;
  system: UnitSystem;
  maxStages: number;
  onSelect: (index: number) => void;
  onAdd: () => void;
  onDuplicate: (index: number) => void;
  onRemove: (index: number) => void;
  onMove: (from: number, to: number) => void;
}

export function StageTimeline(props: StageTimelineProps) {
  const { stages, results, failure, stale, selectedIndex, system, maxStages, onSelect, onAdd, onDuplicate, onRemove, onMove } = props;
  const blockRefs = useRef<(HTMLLIElement | null)[]>([]);
  const [dragFrom, setDragFrom] = useState<number | null>(null);
  const keyboardMove = useRef(false);

  // After a keyboard selection or move, focus follows the selected block.
  useEffect(() => {
    if (keyboardMove.current) {
      blockRefs.current[selectedIndex]?.focus();
      keyboardMove.current = false;
    }
  }, [selectedIndex, stages]);

  const onKeyDown = (e: KeyboardEvent, i: number) => {
    const last = stages.length - 1;
    const to = (j: number) => {
      e.preventDefault();
      keyboardMove.current = true;
      if (e.altKey) onMove(i, j);
      else onSelect(j);
    };
    if (e.key === 'ArrowLeft' && i > 0) to(i - 1);
    else if (e.key === 'ArrowRight' && i < last) to(i + 1);
    else if (e.key === 'Home' && i > 0) to(0);
    else if (e.key === 'End' && i < last) to(last);
  };

  const total = results?.reduce((s, r) => s + r.durationS, 0) ?? 0;
  // Durations are known for every stage only when the whole chain was computed; otherwise equal widths.
  const sized = results !== null && failure === null && results.length === stages.length && total > 0;
  const grow = (i: number) => (sized ? results[i].durationS / total : 1 / stages.length);

  return (
    <section className="panel timeline" aria-labelledby="timeline-heading">
      <div className="panel-head">
        <h2 id="timeline-heading">Stage chain</h2>
        <div className="button-row" role="toolbar" aria-label="Stage chain actions">
          <button type="button" onClick={onAdd} disabled={stages.length >= maxStages}>
            + Add stage after
          </button>
          <button type="button" onClick={() => onDuplicate(selectedIndex)} disabled={stages.length >= maxStages}>
            Duplicate
          </button>
          <button type="button" onClick={() => onMove(selectedIndex, selectedIndex - 1)} disabled={selectedIndex === 0}>
            ◀ Move earlier
          </button>
          <button type="button" onClick={() => onMove(selectedIndex, selectedIndex + 1)} disabled={selectedIndex >= stages.length - 1}>
            Move later ▶
          </button>
          <button type="button" onClick={() => onRemove(selectedIndex)} disabled={stages.length <= 1}>
            Remove
          </button>
        </div>
      </div>
      <p className="hint" id="timeline-keys">
        Arrow keys select a stage; Alt+arrow moves it; drag a block to reorder.
      </p>
      <ol className={stale ? 'stage-row is-stale' : 'stage-row'} role="listbox" aria-orientation="horizontal" aria-label="Stages in order" aria-describedby="timeline-keys">
        {stages.map((stage, i) => (
          <li
            key={i}
            ref={(el) => {
              blockRefs.current[i] = el;
            }}
            role="option"
            aria-selected={i === selectedIndex}
            tabIndex={i === selectedIndex ? 0 : -1}
            className={i === selectedIndex ? 'stage-block is-selected' : 'stage-block'}
            style={{ flexGrow: grow(i) }}
            draggable
            onClick={() => onSelect(i)}
            onKeyDown={(e) => onKeyDown(e, i)}
            onDragStart={(e) => {
              setDragFrom(i);
              e.dataTransfer.effectAllowed = 'move';
              e.dataTransfer.setData('text/plain', String(i));
            }}
            onDragOver={(e) => dragFrom !== null && e.preventDefault()}
            onDrop={(e) => {
              e.preventDefault();
              if (dragFrom !== null) onMove(dragFrom, i);
              setDragFrom(null);
            }}
            onDragEnd={() => setDragFrom(null)}
          >
            <StageBlock index={i} stage={stage} result={results?.[i] ?? null} failed={failure?.index === i ? failure : null} notRun={failure !== null && i > failure.index} system={system} />
          </li>
        ))}
      </ol>
    </section>
  );
}
