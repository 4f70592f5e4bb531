// A hazard already read on an earlier step of the case is one line that opens in place; a new
// hazard is always in full; nothing is ever left out.
import { cleanup, render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it } from 'vitest';
import { hazardsShownBefore } from './caution-history';
import { StepCautions } from './step-cautions';
import { measurementStep, shippedTree } from './walk-step-fixtures';

afterEach(cleanup);

const capTest = measurementStep('cap-test');
const pressureTest = measurementStep('pressure-test');
const [hotCoolant, glycol] = pressureTest.cautions;

describe('hazardsShownBefore', () => {
  it('collects the hazards of the steps walked so far', () => {
    expect(hazardsShownBefore(null, [{ nodeId: capTest.id }])).toEqual(new Set());
    expect(hazardsShownBefore(shippedTree(), [])).toEqual(new Set());
    expect(
      hazardsShownBefore(shippedTree(), [{ nodeId: 'interview-pattern' }, { nodeId: capTest.id }]),
    ).toEqual(new Set(['hot-pressurised-coolant']));
  });
});

describe('StepCautions', () => {
  it('shows every caution in full the first time', () => {
    render(<StepCautions cautions={pressureTest.cautions} />);
    const note = screen.getByTestId('step-cautions');
    expect(note.textContent).toContain(hotCoolant!.text);
    expect(note.textContent).toContain(glycol!.text);
    expect(screen.queryByRole('button')).toBeNull();
  });

  it('shows a repeated hazard as one line that opens in place, a new one in full', async () => {
    const shown = hazardsShownBefore(shippedTree(), [{ nodeId: capTest.id }]);
    render(<StepCautions cautions={pressureTest.cautions} compactHazards={shown} />);
    const note = screen.getByTestId('step-cautions');
    expect(within(note).getByText('Caution')).toBeTruthy();
    expect(note.textContent).toContain('Hot coolant under pressure — as on an earlier step');
    // The new hazard (glycol) is in full.
    expect(screen.getByText(glycol!.text)).toBeTruthy();
    const again = screen.getByRole('button', { name: /Read it again/ });
    expect(again.getAttribute('aria-expanded')).toBe('false');
    const text = document.getElementById(again.getAttribute('aria-controls')!)!;
    expect(text.hidden).toBe(true);

    await userEvent.setup().click(again);
    expect(again.getAttribute('aria-expanded')).toBe('true');
    expect(text.hidden).toBe(false);
    expect(text.textContent).toBe(hotCoolant!.text);
  });
});
