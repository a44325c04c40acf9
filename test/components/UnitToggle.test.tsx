// @vitest-environment jsdom
import { afterEach, describe, expect, it, vi } from 'vitest';
import { cleanup, fireEvent, render, screen } from '@testing-library/react';
import { UnitToggle } from '@/features/units/UnitToggle';

afterEach(cleanup);

describe('UnitToggle', () => {
  it('shows the value as the checked radio and reports a change', () => {
    const onChange = vi.fn();
    render(<UnitToggle value="si" onChange={onChange} />);
    const si = screen.getByRole('radio', { name: 'SI' }) as HTMLInputElement;
    const us = screen.getByRole('radio', { name: 'US' }) as HTMLInputElement;
    expect(si.checked).toBe(true);
    expect(us.checked).toBe(false);
    fireEvent.click(us);
    expect(onChange).toHaveBeenCalledWith('us');
  });
  it('is a labelled group', () => {
    render(<UnitToggle value="us" onChange={() => {}} />);
    expect(screen.getByRole('group', { name: 'Units' })).toBeTruthy();
  });
});
