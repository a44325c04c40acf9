// The variants slice on the real store: copies are independent, every change is one undo step.
import { describe, expect, it } from 'vitest';
import { createAppStore } from '@/state/createAppStore';
import { MAX_VARIANTS } from '@/schema/planFileSchema';
import { demoPlanK, bathVariantK } from './demoDocument';

const store = () => createAppStore({ document: { main: demoPlanK, variants: [] }, nowMs: () => 0 });

describe('variantsSlice', () => {
  it('a new variant is a copy of the main plan; editing it leaves the main plan alone', () => {
    const s = store();
    const id = s.getState().addVariant();
    expect(id).toBe('v1');
    const v = s.getState().document.variants[0];
    expect(v.name).toBe('Variant 1');
    expect({ ...v.plan, name: demoPlanK.name }).toEqual(demoPlanK);
    s.getState().editVariant('v1', (p) => ({ ...p, stages: bathVariantK.stages }));
    expect(s.getState().document.variants[0].plan.stages[1].medium.name).toBe('agitated liquid bath');
    expect(s.getState().document.main.stages[1].medium.name).toBe('still air');
  });

  it('rename keeps the variant name and its plan name together; remove drops only that one', () => {
    const s = store();
    s.getState().addVariant();
    s.getState().addVariant();
    s.getState().renameVariant('v2', 'Liquid bath');
    expect(s.getState().document.variants.map((v) => [v.id, v.name, v.plan.name])).toEqual([
      ['v1', 'Variant 1', 'Variant 1'],
      ['v2', 'Liquid bath', 'Liquid bath'],
    ]);
    s.getState().removeVariant('v1');
    expect(s.getState().document.variants.map((v) => v.id)).toEqual(['v2']);
    // A freed id is used again for the next copy.
    expect(s.getState().addVariant()).toBe('v1');
  });

  it('promote makes the variant the main plan and keeps the old main as a variant in its place', () => {
    const s = store();
    s.getState().addVariant();
    s.getState().editVariant('v1', () => bathVariantK);
    s.getState().promoteVariant('v1');
    const d = s.getState().document;
    expect(d.main).toEqual(bathVariantK);
    expect(d.variants).toHaveLength(1);
    expect(d.variants[0]).toMatchObject({ id: 'v2', name: demoPlanK.name, plan: demoPlanK });
    s.getState().undo();
    expect(s.getState().document.main).toEqual(demoPlanK);
  });

  it('every variant action is one undo step', () => {
    const s = store();
    s.getState().addVariant();
    s.getState().removeVariant('v1');
    s.getState().undo();
    expect(s.getState().document.variants).toHaveLength(1);
    s.getState().undo();
    expect(s.getState().document.variants).toHaveLength(0);
  });

  it(`stops at ${MAX_VARIANTS} variants (the worker takes 20 plans per run)`, () => {
    const s = store();
    for (let i = 0; i < MAX_VARIANTS; i += 1) expect(s.getState().addVariant()).not.toBeNull();
    expect(s.getState().addVariant()).toBeNull();
    expect(s.getState().document.variants).toHaveLength(MAX_VARIANTS);
  });

  it('sheet title block fields are kept on the document', () => {
    const s = store();
    s.getState().setSheetMeta({ revision: 'C' });
    s.getState().setSheetMeta({ checkedBy: 'B. Example' });
    expect(s.getState().document.sheet).toEqual({ revision: 'C', preparedBy: '', checkedBy: 'B. Example', date: '' });
  });
});
