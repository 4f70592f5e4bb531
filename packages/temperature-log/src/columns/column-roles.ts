// Which channel a column holds, guessed from its header words. The rules are Heatpath's own and
// deliberately narrow: a guess that is not clear leaves the column to the person mapping it.

export const COLUMN_ROLES = [
  'time',
  'coolant',
  'intakeAir',
  'ambient',
  'vehicleSpeed',
  'engineSpeed',
  'fanDuty',
] as const;
export type ColumnRole = (typeof COLUMN_ROLES)[number];

/** A role guess; 'temperature' is a temperature column that names no circuit ("Temp"). */
export type RoleGuess = ColumnRole | 'temperature' | null;

function hasAny(words: readonly string[], list: readonly string[]): boolean {
  return words.some((w) => list.includes(w));
}

function hasPhrase(words: readonly string[], phrase: readonly string[]): boolean {
  for (let i = 0; i + phrase.length <= words.length; i += 1) {
    if (phrase.every((p, k) => words[i + k] === p)) {
      return true;
    }
  }
  return false;
}

const TEMPERATURE_WORDS = [
  'temp',
  'temperature',
  'tmp',
  '°c',
  '°f',
  'degc',
  'degf',
  'celsius',
  'fahrenheit',
];
// Words that make a column something other than a temperature reading of that circuit.
const NOT_A_TEMPERATURE = [
  'level',
  'pressure',
  'press',
  'flow',
  'pump',
  'valve',
  'target',
  'setpoint',
  'desired',
  'specified',
  'volt',
  'volts',
  'voltage',
  'v',
  'mv',
  'kpa',
  'bar',
  'psi',
  'maf',
  'map',
  'mass',
];
const TIME_WORDS = [
  'time',
  'timestamp',
  'elapsed',
  'datetime',
  'date',
  'clock',
  'seconds',
  'secs',
  'sec',
];

function isTimeHeader(words: readonly string[]): boolean {
  if (words.length === 0) {
    return false;
  }
  const [first] = words;
  if (words.length === 1 && (first === 't' || first === 's' || first === 'ms')) {
    return true;
  }
  return hasAny(words, TIME_WORDS);
}

/** The role a header suggests. Order matters: "fan speed" is the fan, "engine speed" not the road. */
export function guessRole(words: readonly string[]): RoleGuess {
  if (words.length === 0) {
    return null;
  }
  if (hasAny(words, ['fan'])) {
    return 'fanDuty';
  }
  if (hasAny(words, ['rpm', 'revs']) || hasPhrase(words, ['engine', 'speed'])) {
    return 'engineSpeed';
  }
  if (
    hasAny(words, ['vss', 'kph', 'km/h', 'kmh', 'mph']) ||
    hasPhrase(words, ['vehicle', 'speed']) ||
    hasPhrase(words, ['road', 'speed']) ||
    (words.length <= 2 && words[0] === 'speed')
  ) {
    return 'vehicleSpeed';
  }
  if (hasAny(words, NOT_A_TEMPERATURE)) {
    return isTimeHeader(words) ? 'time' : null;
  }
  if (hasAny(words, ['coolant', 'ect', 'clt']) || hasPhrase(words, ['water', 'temp'])) {
    return 'coolant';
  }
  if (hasPhrase(words, ['engine', 'temp']) || hasPhrase(words, ['engine', 'temperature'])) {
    return 'coolant';
  }
  if (
    hasAny(words, ['iat', 'mat', 'intercooler']) ||
    hasPhrase(words, ['intake', 'air']) ||
    hasPhrase(words, ['inlet', 'air']) ||
    hasPhrase(words, ['charge', 'air']) ||
    hasPhrase(words, ['manifold', 'air']) ||
    (hasAny(words, ['intake', 'charge', 'boost']) && hasAny(words, TEMPERATURE_WORDS))
  ) {
    return 'intakeAir';
  }
  if (hasAny(words, ['ambient', 'aat', 'oat', 'outside', 'outdoor', 'exterior'])) {
    return 'ambient';
  }
  if (isTimeHeader(words)) {
    return 'time';
  }
  if (hasAny(words, TEMPERATURE_WORDS)) {
    return 'temperature';
  }
  return null;
}

/** Whether a role holds temperatures (and so follows the file's °C/°F). */
export function isTemperatureRole(role: ColumnRole): boolean {
  return role === 'coolant' || role === 'intakeAir' || role === 'ambient';
}

/** How a role is named in messages and forms. */
export const ROLE_LABELS: Readonly<Record<ColumnRole, string>> = {
  time: 'time',
  coolant: 'coolant temperature',
  intakeAir: 'intake or charge-air temperature',
  ambient: 'ambient temperature',
  vehicleSpeed: 'vehicle speed',
  engineSpeed: 'engine speed',
  fanDuty: 'fan duty or command',
};
