// The step the case stands at, large: what kind of step and its title, its cautions before
// anything else, then the prompt or instruction, the tools and time; beside it (below it on a
// narrow screen) the answer controls, the evidence it asks for and "Step back".
import type { CaseDetail, UnitPreferences } from '@heatpath/contracts';
import { Button } from '../../../components/ui/button';
import { MeasurementForm } from '../../../components/walk-step/measurement-form';
import { OutcomeSummary } from '../../../components/walk-step/outcome-summary';
import { ProcedureAnswers } from '../../../components/walk-step/procedure-answers';
import { QuestionAnswers } from '../../../components/walk-step/question-answers';
import { StepCautions } from '../../../components/walk-step/step-cautions';
import { StepFrame } from '../../../components/walk-step/step-frame';
import { stepKindLabels } from '../../../lib/step-labels';
import type { WalkModel } from '../case-tree';
import type { WalkAnswers } from '../hooks/use-walk-answers';
import { AnswerStatus } from './answer-status';
import { StepEvidence } from './step-evidence';

interface CurrentStepProps {
  detail: CaseDetail;
  model: WalkModel | null;
  answers: WalkAnswers;
  preferences: UnitPreferences;
}

export function CurrentStep({ detail, model, answers, preferences }: CurrentStepProps) {
  const { walk } = detail;
  const node = walk.currentNode;
  const canWalk = detail.can.walk;
  const disabled = !canWalk || answers.pending !== null;
  const pendingEvent = answers.pending?.event;
  const stepAttachments = detail.attachments.filter((a) => a.nodeId === node.id);
  const refusedFields = answers.notice?.kind === 'refused' ? answers.notice.fields : {};

  const stepBack =
    canWalk && walk.canGoBack ? (
      <div className="border-t-2 border-line pt-4">
        <Button
          variant="secondary"
          disabled={answers.pending !== null}
          onClick={() =>
            answers.answer(
              { type: 'walk.back', nodeId: node.id, position: walk.position },
              'Step back',
            )
          }
        >
          <span aria-hidden="true">←</span> Step back
        </Button>
      </div>
    ) : null;

  const status = (
    <AnswerStatus
      pending={answers.pending}
      notice={answers.notice}
      onRetry={answers.retry}
      onDiscard={answers.discard}
      onDismiss={answers.dismissNotice}
    />
  );

  if (node.kind === 'outcome') {
    return (
      <OutcomeSummary outcome={node} stepNumber={walk.path.length + 1}>
        {status}
        {stepBack}
      </OutcomeSummary>
    );
  }

  const text = node.kind === 'procedure' ? node.instruction : node.prompt;
  const facts = [
    node.tools.length > 0 ? `Tools: ${node.tools.join(', ')}` : null,
    node.estimatedMinutes !== undefined ? `About ${node.estimatedMinutes} min` : null,
  ].filter(Boolean);

  // On a wide screen the cautions take the left column. Short answer controls (choices, Done)
  // then sit under the instruction on the right, so both stay in view beside long cautions; a
  // measurement's boxes need the right column to themselves, and its prompt goes under the cautions.
  const textBeside = node.cautions.length > 0 && node.kind !== 'measurement';
  const instruction = (
    <div className="flex flex-col gap-2">
      <p className="text-lg" data-testid="step-instruction">
        {text}
      </p>
      {facts.length > 0 ? <p className="text-ink-muted">{facts.join(' · ')}</p> : null}
    </div>
  );
  const why = node.notes ? (
    <p className="text-sm text-ink-muted">
      <span className="font-semibold">Why this step: </span>
      {node.notes}
    </p>
  ) : null;

  return (
    <StepFrame
      title={node.title}
      where={`Step ${walk.path.length + 1} · ${stepKindLabels[node.kind]}`}
    >
      <div
        className={
          'grid gap-5 ' +
          (node.kind === 'measurement'
            ? 'lg:grid-cols-[minmax(0,1.15fr)_minmax(0,1fr)]'
            : 'lg:grid-cols-2')
        }
      >
        <div className="flex flex-col gap-4">
          <StepCautions cautions={node.cautions} />
          {textBeside ? null : instruction}
        </div>
        <div className="flex flex-col gap-4">
          {textBeside ? instruction : null}
          {status}
          {!canWalk ? (
            <p className="rounded-control bg-sunken p-3">
              {detail.status === 'diagnosed' || detail.status === 'closed'
                ? 'This case is finished; its walk can no longer change.'
                : 'Read only: a technician or the lead answers the steps.'}
            </p>
          ) : node.kind === 'question' ? (
            <QuestionAnswers
              node={node}
              position={walk.position}
              disabled={disabled}
              pendingChoiceId={
                pendingEvent?.type === 'answer.choice' ? pendingEvent.choiceId : null
              }
              onAnswer={answers.answer}
            />
          ) : node.kind === 'measurement' ? (
            <MeasurementForm
              // A new step or a step revisited starts with empty boxes.
              key={`${node.id}:${walk.position}`}
              node={node}
              position={walk.position}
              model={model}
              preferences={preferences}
              disabled={disabled}
              refusedFields={refusedFields}
              onAnswer={answers.answer}
            />
          ) : (
            <ProcedureAnswers
              key={`${node.id}:${walk.position}`}
              node={node}
              position={walk.position}
              disabled={disabled}
              pendingResult={pendingEvent?.type === 'answer.procedure' ? pendingEvent.result : null}
              onAnswer={answers.answer}
            />
          )}
          <StepEvidence
            caseId={detail.id}
            nodeId={node.id}
            requests={node.evidence}
            attachments={stepAttachments}
            canAttach={canWalk}
          />
          {stepBack}
          {why}
        </div>
      </div>
    </StepFrame>
  );
}
