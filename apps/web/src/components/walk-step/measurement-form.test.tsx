// The readings form keeps what was typed across a reload (a draft per case and step), starts the
// next step in a unit the person chose, and cannot be answered while the step is blocked.
import type { Me } from '@heatpath/contracts';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, render, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { ComponentProps } from 'react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { json, makeMe, mockApi } from '../../test/api-mock';
import { meQueryKey } from '../../lib/auth';
import { loadReadingDraft, readingDraftId, saveReadingDraft } from '../../lib/reading-drafts';
import { MeasurementForm } from './measurement-form';
import { measurementStep } from './walk-step-fixtures';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
  window.localStorage.clear();
});

const capTest = measurementStep('cap-test');
const pressureTest = measurementStep('pressure-test');
const draftId = readingDraftId('case-1', capTest.id);

function setup(start: Me = makeMe({ role: 'technician' })) {
  let server = start;
  const api = mockApi({
    'GET /api/me': () => json(server),
    'PATCH /api/me/preferences': (request) => {
      const body = request.body as { units: Partial<Me['preferences']['units']> };
      server = {
        ...server,
        preferences: { units: { ...server.preferences.units, ...body.units } },
      };
      return json(server);
    },
  });
  const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  client.setQueryData(meQueryKey, start);
  const preferences = () => client.getQueryData<Me>(meQueryKey)!.preferences.units;
  const show = (props: Partial<ComponentProps<typeof MeasurementForm>> = {}) =>
    render(
      <QueryClientProvider client={client}>
        <MeasurementForm
          node={capTest}
          position={5}
          model={null}
          preferences={preferences()}
          onAnswer={() => {}}
          {...props}
        />
      </QueryClientProvider>,
    );
  const preferenceSaves = () =>
    api.requests.filter((r) => r.method === 'PATCH' && r.path === '/api/me/preferences');
  return { client, preferences, show, preferenceSaves };
}

const unitBox = (label: string) => screen.getByLabelText(`Unit for ${label}`) as HTMLSelectElement;
const box = (label: string) => screen.getByLabelText(label) as HTMLInputElement;

describe('MeasurementForm', () => {
  it('keeps typed readings and chosen units across a reload', async () => {
    const { show } = setup();
    const user = userEvent.setup();
    const first = show({ draftId });
    await user.selectOptions(unitBox('Cap rating'), 'psi');
    await user.type(box('Cap rating'), '21');
    await user.type(box('Pressure at which the cap opened'), '1,3');
    first.unmount();

    // The page is loaded again: the same step finds the boxes as they were left.
    show({ draftId, preferences: makeMe().preferences.units });
    expect(box('Cap rating').value).toBe('21');
    expect(unitBox('Cap rating').value).toBe('psi');
    expect(box('Pressure at which the cap opened').value).toBe('1,3');
    expect(unitBox('Pressure at which the cap opened').value).toBe('bar');
    expect(box('Pressure the cap still holds after one minute').value).toBe('');
  });

  it('saves a chosen unit as the person’s preference, so the next step starts in it', async () => {
    const { show, preferences, preferenceSaves } = setup();
    const user = userEvent.setup();
    const first = show({ draftId });
    await user.selectOptions(unitBox('Cap rating'), 'psi');
    expect(preferences().pressure).toBe('psi');
    await waitFor(() => expect(preferenceSaves()).toHaveLength(1));
    expect(preferenceSaves()[0]?.body).toEqual({ units: { pressure: 'psi' } });
    first.unmount();

    const [hold, after] = pressureTest.inputs;
    const next = show({ node: pressureTest, draftId: readingDraftId('case-1', pressureTest.id) });
    expect(unitBox(hold!.label).value).toBe('psi');
    expect(unitBox(after!.label).value).toBe('psi');
    next.unmount();

    // A draft's own unit wins over the preference for its step.
    const draftOfNext = readingDraftId('case-1', pressureTest.id);
    saveReadingDraft(draftOfNext, {
      values: { [hold!.name]: '1.2' },
      units: { [hold!.name]: 'bar' },
    });
    show({ node: pressureTest, draftId: draftOfNext });
    expect(unitBox(hold!.label).value).toBe('bar');
    expect(box(hold!.label).value).toBe('1.2');
    expect(unitBox(after!.label).value).toBe('psi');
  });

  it('saves no preference where the person’s units are not used (Try it)', async () => {
    const { show, preferenceSaves } = setup();
    const user = userEvent.setup();
    show({ preferences: undefined });
    await user.selectOptions(unitBox('Cap rating'), 'psi');
    expect(unitBox('Cap rating').value).toBe('psi');
    expect(preferenceSaves()).toHaveLength(0);
  });

  it('clears the draft once the step is answered, and keeps it when the answer is refused', async () => {
    const { show } = setup();
    const user = userEvent.setup();
    const onAnswer = vi.fn();
    const fill = async () => {
      await user.type(box('Cap rating'), '1.4');
      await user.type(box('Pressure at which the cap opened'), '1.4');
      await user.type(box('Pressure the cap still holds after one minute'), '1.35');
      await user.click(screen.getByRole('button', { name: 'Save readings' }));
    };

    const refused = show({ draftId, onAnswer });
    await fill();
    expect(onAnswer).toHaveBeenCalledTimes(1);
    refused.rerender(
      <QueryClientProvider client={new QueryClient()}>
        <MeasurementForm
          node={capTest}
          position={5}
          model={null}
          draftId={draftId}
          refusedFields={{ capRating: 'Check the rating stamped on the cap.' }}
          onAnswer={onAnswer}
        />
      </QueryClientProvider>,
    );
    refused.unmount();
    expect(loadReadingDraft(draftId)?.values).toMatchObject({ capRating: '1.4' });

    window.localStorage.clear();
    const answered = show({ draftId, onAnswer });
    await fill();
    expect(onAnswer).toHaveBeenCalledTimes(2);
    expect(loadReadingDraft(draftId)).not.toBeNull();
    answered.unmount();
    expect(loadReadingDraft(draftId)).toBeNull();
  });

  it('cannot be answered while the step is blocked, and says why', async () => {
    const { show } = setup();
    const user = userEvent.setup();
    const onAnswer = vi.fn();
    const reason =
      'This step needs a photo first: Photo of the cap on the tester. Add it, then answer.';
    show({ draftId, onAnswer, blockedReason: reason });
    const button = screen.getByRole('button', { name: 'Save readings' }) as HTMLButtonElement;
    expect(button.disabled).toBe(true);
    expect(screen.getByRole('status').textContent).toContain(reason);
    expect(button.getAttribute('aria-describedby')).toBe(screen.getByRole('status').id);
    // The readings can still be typed while the photo is taken.
    await user.type(box('Cap rating'), '1.4');
    await user.type(box('Cap rating'), '{Enter}');
    expect(box('Cap rating').value).toBe('1.4');
    expect(onAnswer).not.toHaveBeenCalled();
  });
});
