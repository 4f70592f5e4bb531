// The step the case stands at on this tablet, large: what kind of step and its title, its
// cautions before anything else (compact where the case already showed that hazard), then the
// prompt or instruction, the tools and time; beside it (below it on a narrow screen) what waits
// to be sent, the answer controls, the evidence it asks for and "Step back".
import type { CaseDetail, UnitPreferences } from '@heatpath/contracts';
import type { CompiledTree } from '@heatpath/fault-tree';
import { useMemo } from 'react';
import { Button } from '../../../components/ui/button';
import { hazardsShownBefore } from '../../../components/walk-step/caution-history';
import { MeasurementForm } from '../../../components/walk-step/measurement-form';
import { OutcomeSummary } from '../../../components/walk-step/outcome-summary';
import { ProcedureAnswers } from '../../../components/walk-step/procedure-answers';
import { QuestionAnswers } from '../../../components/walk-step/question-answers';
import { StepCautions } from '../../../components/walk-step/step-cautions';
import { StepFrame } from '../../../components/walk-step/step-frame';
import { useQueuedPhotos } from '../../../lib/outbox';
import { readingDraftId } from '../../../lib/reading-drafts';
import { stepKindLabels } from '../../../lib/step-labels';
import { useAnswerBlockedReason } from '../hooks/use-evidence-gate';
import type { WalkControls } from '../hooks/use-local-walk';
import { AnswerStatus } from './answer-status';
import { HeldAnswers } from './held-answers';
import { StepEvidence } from './step-evidence';

interface CurrentStepProps {
  detail: CaseDetail;
  controls: WalkControls;
  tree: CompiledTree | null;
  preferences: UnitPreferences;
}

export function CurrentStep({ detail, controls, tree, preferences }: CurrentStepProps) {
  const { walk, model, notice } = controls;
  const node = walk.currentNode;
  const canWalk = detail.can.walk;
  const disabled = !canWalk || controls.waitingForServer;
  const stepAttachments = detail.attachments.filter((a) => a.nodeId === node.id);
  const queuedPhotos = useQueuedPhotos(detail.id, node.id);
  const blockedReason = useAnswerBlockedReason(detail, node);
  const compactHazards = useMemo(() => hazardsShownBefore(tree, walk.path), [tree, walk.path]);
  const refusedFields = notice?.fields ?? {};

  const stepBack =
    canWalk && walk.canGoBack ? (
      <div className="border-t-2 border-line pt-4">
        <Button
          variant="secondary"
          disabled={controls.waitingForServer}
          onClick={() =>
            controls.answer(
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
    <>
      <HeldAnswers caseId={detail.id} tree={tree} onAnswerAgain={controls.refresh} />
      <AnswerStatus caseId={detail.id} tree={tree} notice={notice} />
    </>
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
  // A new step, or a step come back to, starts its controls afresh (a measurement from its draft).
  const stepKey = `${node.id}:${walk.position}`;

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
          <StepCautions cautions={node.cautions} compactHazards={compactHazards} />
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
              key={stepKey}
              node={node}
              position={walk.position}
              disabled={disabled}
              blockedReason={blockedReason}
              onAnswer={controls.answer}
            />
          ) : node.kind === 'measurement' ? (
            <MeasurementForm
              key={stepKey}
              node={node}
              position={walk.position}
              model={model}
              preferences={preferences}
              disabled={disabled}
              refusedFields={refusedFields}
              draftId={readingDraftId(detail.id, node.id)}
              blockedReason={blockedReason}
              onAnswer={controls.answer}
            />
          ) : (
            <ProcedureAnswers
              key={stepKey}
              node={node}
              position={walk.position}
              disabled={disabled}
              blockedReason={blockedReason}
              onAnswer={controls.answer}
            />
          )}
          <StepEvidence
            caseId={detail.id}
            nodeId={node.id}
            requests={node.evidence}
            attachments={stepAttachments}
            queuedPhotos={queuedPhotos}
            canAttach={canWalk}
          />
          {stepBack}
          {why}
        </div>
      </div>
    </StepFrame>
  );
}
