// The training area's answers, shaped from loaded records (no database reads here).
import type {
  AttemptStep,
  Casebook,
  CasebookEntry,
  TrainingCourse as TrainingCourseView,
  TrainingScore,
  TrainingAttempt as TrainingAttemptView,
  TrainingStep,
} from '@heatpath/contracts';
import type {
  DiagnosticCase,
  TrainingAttempt,
  TrainingCase,
  TrainingCourse,
  TrainingCourseItem,
  TrainingPrediction,
  TrainingSignOff,
  TreeVersion,
  User,
} from '../db/models/index';
import type { TrainingStory } from '../services/training/training-story';

/** The tree version a training case was walked on, as a learner reads it. */
export function presentTrainingTree(version: TreeVersion) {
  return { version: version.version, status: version.status, definition: version.definition };
}

/** The step as shown before its prediction: where it led, and why, stay hidden. */
export function concealed(step: TrainingStep): TrainingStep {
  return { ...step, routeLabel: null, next: null, why: null };
}

/** An attempt as its learner sees it: answered steps in full, the current one concealed. */
export function presentAttempt(
  story: TrainingStory,
  entry: CasebookEntry,
  attempt: TrainingAttempt,
  predictions: readonly TrainingPrediction[],
): TrainingAttemptView {
  const byIndex = new Map(predictions.map((p) => [p.stepIndex, p]));
  const steps: AttemptStep[] = [];
  let current: TrainingAttemptView['current'] = null;
  for (const [index, step] of story.steps.entries()) {
    const plan = story.plans[index] ?? null;
    const made = byIndex.get(index);
    if (plan === null) {
      steps.push({ step, prediction: null });
      continue;
    }
    if (made === undefined) {
      current = {
        step: concealed(step),
        ask: {
          kind: plan.kind,
          question: plan.question,
          options: plan.options.map((o) => ({ id: o.id, label: o.label })),
          maxPoints: plan.maxPoints,
        },
      };
      break;
    }
    steps.push({
      step,
      prediction: {
        kind: plan.kind,
        question: plan.question,
        options: plan.options.map((o) => ({ id: o.id, label: o.label })),
        maxPoints: plan.maxPoints,
        chosenId: made.chosenId,
        correctId: made.correctId,
        correct: made.points === made.maxPoints,
        points: made.points,
      },
    });
  }
  const finished = attempt.status === 'finished';
  return {
    id: attempt.id,
    trainingCaseId: attempt.trainingCaseId,
    status: attempt.status,
    startedAt: attempt.startedAt.toISOString(),
    finishedAt: attempt.finishedAt?.toISOString() ?? null,
    score: attempt.score,
    maxScore: attempt.maxScore,
    steps,
    current,
    trainingCase: entry,
    teachingNote: finished ? story.teachingNote : null,
    outcome: finished ? story.outcome : null,
    findings: finished ? story.findings : null,
  };
}

/** The learner's casebook: courses meant for them (only cases still available) and every case. */
export function presentCasebook(parts: {
  courses: readonly TrainingCourse[];
  signOffs: readonly TrainingSignOff[];
  available: ReadonlySet<string>;
  stories: readonly TrainingStory[];
  mine: ReadonlyMap<string, { attempts: number; best: TrainingScore | null }>;
}): Casebook {
  const { courses, signOffs, available, stories, mine } = parts;
  return {
    courses: courses.map((course) => {
      const signOff = signOffs.find((s) => s.courseId === course.id);
      return {
        id: course.id,
        title: course.title,
        description: course.description,
        forEveryone: course.apprenticeId === null,
        trainingCaseIds: [...(course.items ?? [])]
          .sort((a, b) => a.position - b.position)
          .map((item) => item.trainingCaseId)
          .filter((id) => available.has(id)),
        signOff: signOff ? presentSignOff(signOff) : null,
      };
    }),
    cases: stories.map((story) => ({
      ...story.entry,
      attempts: mine.get(story.entry.id)?.attempts ?? 0,
      bestScore: mine.get(story.entry.id)?.best ?? null,
    })),
  };
}

/** A lead's sign-off of a course: when, by whom, and the note. */
export function presentSignOff(
  signOff: TrainingSignOff,
  signer: User | null = signOff.signer ?? null,
) {
  return {
    signedAt: signOff.signedAt.toISOString(),
    signedBy: { id: signOff.signedBy, name: signer?.name ?? 'The lead' },
    note: signOff.note,
  };
}

/** A course with its cases in order and the apprentice it is for (null: everyone). */
export function presentCourse(
  course: TrainingCourse,
  items: readonly TrainingCourseItem[],
  apprentice: Pick<User, 'id' | 'name'> | null,
): TrainingCourseView {
  return {
    id: course.id,
    title: course.title,
    description: course.description,
    apprentice: apprentice ? { id: apprentice.id, name: apprentice.name } : null,
    items: items.map((item) => ({
      trainingCaseId: item.trainingCaseId,
      symptom:
        (item.trainingCase as (TrainingCase & { case?: DiagnosticCase }) | undefined)?.case
          ?.symptom ?? '',
      difficulty: item.trainingCase?.difficulty ?? 'starter',
    })),
    createdAt: course.createdAt.toISOString(),
    updatedAt: course.updatedAt.toISOString(),
  };
}
