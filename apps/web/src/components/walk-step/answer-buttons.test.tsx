// A question's choices and a procedure's answers are disabled while the step is blocked (a
// required photo is missing), with the reason beside them; without a reason they work as before.
import { cleanup, render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { ProcedureAnswers } from './procedure-answers';
import { QuestionAnswers } from './question-answers';
import { procedureStep, questionStep } from './walk-step-fixtures';

afterEach(cleanup);

const reason = 'This step needs a photo first: Photo of the leak. Add it, then answer.';
const question = questionStep('interview-pattern');
const procedure = procedureStep('bleed-first');

describe('blocked answers', () => {
  it('disables every choice of a question and says why', async () => {
    const onAnswer = vi.fn();
    const view = render(
      <QuestionAnswers node={question} position={0} blockedReason={reason} onAnswer={onAnswer} />,
    );
    const choices = screen.getAllByRole('button') as HTMLButtonElement[];
    expect(choices).toHaveLength(question.choices.length);
    expect(choices.every((choice) => choice.disabled)).toBe(true);
    const status = screen.getByRole('status');
    expect(status.textContent).toContain(reason);
    expect(choices[0]?.getAttribute('aria-describedby')).toContain(status.id);

    view.rerender(<QuestionAnswers node={question} position={0} onAnswer={onAnswer} />);
    expect(screen.queryByRole('status')).toBeNull();
    await userEvent.setup().click(screen.getAllByRole('button')[0]!);
    expect(onAnswer).toHaveBeenCalledTimes(1);
  });

  it('disables a procedure’s answers but not its note', async () => {
    const onAnswer = vi.fn();
    render(
      <ProcedureAnswers node={procedure} position={3} blockedReason={reason} onAnswer={onAnswer} />,
    );
    const done = screen.getByRole('button', { name: 'Done' }) as HTMLButtonElement;
    expect(done.disabled).toBe(true);
    expect(screen.getByRole('status').textContent).toContain(reason);
    expect(done.getAttribute('aria-describedby')).toBe(screen.getByRole('status').id);
    const note = screen.getByRole('button', { name: 'Add a note' }) as HTMLButtonElement;
    expect(note.disabled).toBe(false);
    await userEvent.setup().click(done);
    expect(onAnswer).not.toHaveBeenCalled();
  });
});
