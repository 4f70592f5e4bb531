// The pieces a finding is written in, wherever one is shown (the case page, Try it, training):
// its root cause and correction, and its lists of parts, labour and follow-ups under a heading.
// Parts read "2 × Thermostat", labour "Replace thermostat: 1.2 h".

type Heading = 'h3' | 'h4';

export function CauseAndCorrection({
  rootCause,
  correction,
}: {
  rootCause: string;
  correction: string;
}) {
  return (
    <>
      <div>
        <h3 className="font-bold">Root cause</h3>
        <p className="text-lg">{rootCause}</p>
      </div>
      <div>
        <h3 className="font-bold">Correction</h3>
        <p>{correction}</p>
      </div>
    </>
  );
}

/** A heading and its bulleted lines; nothing when there are no lines. */
export function OutcomeLines({
  title,
  items,
  Heading = 'h3',
}: {
  title: string;
  items: readonly string[];
  Heading?: Heading;
}) {
  if (items.length === 0) return null;
  return (
    <div>
      <Heading className="font-bold">{title}</Heading>
      <ul className="list-disc pl-6">
        {items.map((item, at) => (
          <li key={`${at}-${item}`}>{item}</li>
        ))}
      </ul>
    </div>
  );
}

export function partLines(parts: readonly { quantity: number; description: string }[]): string[] {
  return parts.map((part) => `${part.quantity} × ${part.description}`);
}

export function labourLines(labour: readonly { operation: string; hours: number }[]): string[] {
  return labour.map((line) => `${line.operation}: ${line.hours} h`);
}
