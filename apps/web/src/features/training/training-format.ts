// Words and small formats the training screens share: a vehicle without plate or VIN, a
// difficulty with its mark, a score, a date. No fault-tree code at run time.
import {
  trainingDifficultyLabels,
  type TrainingDifficulty,
  type TrainingScore,
  type TrainingVehicle,
} from '@heatpath/contracts';

/** "Corvane Tessel, 2017 · 1.4 petrol": what a learner may know of the car. */
export function trainingVehicleName(vehicle: TrainingVehicle): string {
  const name = `${vehicle.make} ${vehicle.model}`;
  const withYear = vehicle.year ? `${name}, ${vehicle.year}` : name;
  return vehicle.engine ? `${withYear} · ${vehicle.engine}` : withYear;
}

// Filled dots as well as the word, so the difficulty reads in greyscale and at a glance.
const difficultyMarks: Record<TrainingDifficulty, string> = {
  starter: '●○○',
  practised: '●●○',
  advanced: '●●●',
};

export function difficultyText(difficulty: TrainingDifficulty): string {
  return trainingDifficultyLabels[difficulty];
}

export function difficultyMark(difficulty: TrainingDifficulty): string {
  return difficultyMarks[difficulty];
}

/** "7 / 10". */
export function scoreText(score: TrainingScore): string {
  return `${score.score} / ${score.maxScore}`;
}

export function scorePercent(score: TrainingScore): number {
  return score.maxScore > 0 ? Math.round((score.score / score.maxScore) * 100) : 0;
}

const date = new Intl.DateTimeFormat(undefined, {
  day: 'numeric',
  month: 'short',
  year: 'numeric',
});
const dateTime = new Intl.DateTimeFormat(undefined, {
  day: 'numeric',
  month: 'short',
  hour: '2-digit',
  minute: '2-digit',
});

export function formatDate(iso: string): string {
  const value = new Date(iso);
  return Number.isNaN(value.getTime()) ? iso : date.format(value);
}

export function formatWhen(iso: string): string {
  const value = new Date(iso);
  return Number.isNaN(value.getTime()) ? iso : dateTime.format(value);
}

export function countText(count: number, one: string, many: string): string {
  return `${count} ${count === 1 ? one : many}`;
}

const mileage = new Intl.NumberFormat(undefined, { maximumFractionDigits: 0 });

export function formatMileageText(value: number | null, unit: 'km' | 'mi'): string | null {
  return value === null ? null : `${mileage.format(value)} ${unit}`;
}
