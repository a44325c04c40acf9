// @vitest-environment jsdom
// The stage chain: block widths follow computed durations, arrows select, Alt+arrows move, buttons act
// on the selected stage, and each block says its medium, h, end condition, duration and method in words.
// Results are the hand-built shaft fixture (durations 20 s, 182.5 s, 600 s).
import { afterEach, describe, expect, it, vi } from 'vitest';
import { cleanup, fireEvent, render, screen, within } from '@testing-library/react';
import demoPlan from '@/library/plans/demo-plan.json';
import { parsePlan } from '@/schema/parsePlan';
import { StageTimeline, type StageTimelineProps } from '@/features/stages/StageTimeline';
import { quenchedShaftResult } from './fixtures/quenchedShaftResult';

afterEach(cleanup);

const parsed = parsePlan(demoPlan);
if (!parsed.ok) throw new Error('demo plan invalid');
const plan = parsed.plan;
/** flex-grow is written with float text; shares are compared to 1e-9. */
const SHARE_TOLERANCE = 1e-9;

function renderTimeline(over: Partial<StageTimelineProps> = {}) {
  const props: StageTimelineProps = {
    stages: plan.stages,
    results: quenchedShaftResult.stages,
    failure: null,
    stale: false,
    selectedIndex: 0,
    system: 'si',
    maxStages: 50,
    onSelect: vi.fn(),
    onAdd: vi.fn(),
    onDuplicate: vi.fn(),
    onRemove: vi.fn(),
    onMove: vi.fn(),
    ...over,
  };
  render(<StageTimeline {...props} />);
  return props;
}

const blocks = () => screen.getAllByRole('option');

describe('StageTimeline', () => {
  it('sizes blocks by computed duration: 20 s, 182.5 s, 600 s of 802.5 s', () => {
    renderTimeline();
    const total = 20 + 182.5 + 600;
    [20, 182.5, 600].forEach((d, i) => {
      const grow = Number(blocks()[i].style.flexGrow);
      expect(Math.abs(grow - d / total), `block ${i + 1}: got ${grow}, expected ${d / total}`).toBeLessThan(SHARE_TOLERANCE);
    });
  });

  it('uses equal widths before any result', () => {
    renderTimeline({ results: null });
    for (const b of blocks()) expect(Number(b.style.flexGrow)).toBeCloseTo(1 / 3, 12);
  });

  it('says medium, h, end, duration and method in each block', () => {
    renderTimeline();
    const first = within(blocks()[0]);
    expect(first.getByText('ends after 15 s')).toBeTruthy();
    expect(first.getByText('h 10 W/(m²·K) + radiation')).toBeTruthy();
    expect(blocks()[0].textContent).toMatch(/takes 20 s/);
    expect(blocks()[0].textContent).toMatch(/Lumped capacitance/);
    expect(blocks()[1].textContent).toMatch(/h by boiling curve/);
    expect(blocks()[1].textContent).toMatch(/ends when centre reaches 200\.0 °C/);
    expect(blocks()[1].textContent).toMatch(/takes 3 min 03 s/);
    expect(blocks()[0].getAttribute('aria-selected')).toBe('true');
    expect(blocks()[1].getAttribute('aria-selected')).toBe('false');
  });

  it('arrow keys select, Alt+arrow moves, Home/End jump', () => {
    const props = renderTimeline({ selectedIndex: 1 });
    fireEvent.keyDown(blocks()[1], { key: 'ArrowRight' });
    expect(props.onSelect).toHaveBeenLastCalledWith(2);
    fireEvent.keyDown(blocks()[1], { key: 'ArrowLeft', altKey: true });
    expect(props.onMove).toHaveBeenLastCalledWith(1, 0);
    fireEvent.keyDown(blocks()[1], { key: 'End', altKey: true });
    expect(props.onMove).toHaveBeenLastCalledWith(1, 2);
    fireEvent.keyDown(blocks()[1], { key: 'Home' });
    expect(props.onSelect).toHaveBeenLastCalledWith(0);
  });

  it('only the selected block is in the tab order', () => {
    renderTimeline({ selectedIndex: 2 });
    expect(blocks().map((b) => b.tabIndex)).toEqual([-1, -1, 0]);
  });

  it('buttons act on the selected stage and are disabled where they cannot', () => {
    const props = renderTimeline({ selectedIndex: 0 });
    expect((screen.getByRole('button', { name: '◀ Move earlier' }) as HTMLButtonElement).disabled).toBe(true);
    fireEvent.click(screen.getByRole('button', { name: 'Move later ▶' }));
    expect(props.onMove).toHaveBeenCalledWith(0, 1);
    fireEvent.click(screen.getByRole('button', { name: 'Duplicate' }));
    expect(props.onDuplicate).toHaveBeenCalledWith(0);
    fireEvent.click(screen.getByRole('button', { name: 'Remove' }));
    expect(props.onRemove).toHaveBeenCalledWith(0);
    fireEvent.click(screen.getByRole('button', { name: '+ Add stage after' }));
    expect(props.onAdd).toHaveBeenCalled();
  });

  it('dropping a dragged block moves it', () => {
    const props = renderTimeline();
    const dataTransfer = { setData: vi.fn(), effectAllowed: '' };
    fireEvent.dragStart(blocks()[0], { dataTransfer });
    fireEvent.dragOver(blocks()[2], { dataTransfer });
    fireEvent.drop(blocks()[2], { dataTransfer });
    expect(props.onMove).toHaveBeenCalledWith(0, 2);
  });

  it('a failed stage says so in words and later stages say they were not run', () => {
    renderTimeline({ results: quenchedShaftResult.stages.slice(0, 1), failure: { index: 1, name: 'oil quench', code: 'target-unreachable', message: 'The centre cannot reach 200 °C in a 250 °C bath.' } });
    expect(blocks()[1].textContent).toMatch(/✖ not computed \(reason in the stage report\)/);
    expect(within(blocks()[1]).getByTitle('The centre cannot reach 200 °C in a 250 °C bath.')).toBeTruthy();
    // Durations of the later stages are unknown: equal widths.
    for (const b of blocks()) expect(Number(b.style.flexGrow)).toBeCloseTo(1 / 3, 12);
    expect(blocks()[2].textContent).toMatch(/not run \(an earlier stage failed\)/);
  });
});
