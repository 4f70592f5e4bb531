// The line editors of a findings form — parts, labour and follow-ups — shared by the
// technician's findings editor and the advisor's repair-order review, which keep the same form
// values. Rows stack on a narrow panel and line up in columns where the panel is wide.
import { useFieldArray, type UseFormReturn } from 'react-hook-form';
import { Button } from './ui/button';
import { TextAreaField, TextField } from './ui/field';

/** A findings form as typed: numbers stay text until the request is built and checked. */
export interface FindingsFormValues {
  concern: string;
  cause: string;
  correction: string;
  parts: { description: string; quantity: string; partNumber: string }[];
  labour: { operation: string; hours: string }[];
  followUps: { text: string }[];
  /** Photos chosen for the repair order (the advisor's review only). */
  photoIds?: string[];
}

export function FindingsLinesFields({
  form,
  followUpHint,
}: {
  form: UseFormReturn<FindingsFormValues>;
  followUpHint?: string;
}) {
  const { errors } = form.formState;
  const parts = useFieldArray({ control: form.control, name: 'parts' });
  const labour = useFieldArray({ control: form.control, name: 'labour' });
  const followUps = useFieldArray({ control: form.control, name: 'followUps' });
  return (
    <>
      <fieldset className="flex flex-col gap-3">
        <legend className="mb-2 text-lg font-bold">Parts</legend>
        {parts.fields.length === 0 ? <p className="text-ink-muted">No parts.</p> : null}
        {parts.fields.map((field, index) => (
          <div
            key={field.id}
            className="grid gap-3 rounded-control border-2 border-line p-3 @lg:grid-cols-[minmax(0,1fr)_6.5rem_9rem] @lg:items-end"
          >
            <TextField
              label={`Part ${index + 1}`}
              error={errors.parts?.[index]?.description?.message}
              {...form.register(`parts.${index}.description`)}
            />
            <TextField
              label={
                <>
                  Quantity<span className="sr-only"> of part {index + 1}</span>
                </>
              }
              inputMode="decimal"
              error={errors.parts?.[index]?.quantity?.message}
              {...form.register(`parts.${index}.quantity`)}
            />
            <TextField
              label={
                <>
                  Part number<span className="sr-only"> of part {index + 1}</span>
                </>
              }
              autoCapitalize="characters"
              spellCheck={false}
              error={errors.parts?.[index]?.partNumber?.message}
              {...form.register(`parts.${index}.partNumber`)}
            />
            <div className="@lg:col-span-3">
              <Button variant="quiet" onClick={() => parts.remove(index)}>
                Remove part {index + 1}
              </Button>
            </div>
          </div>
        ))}
        <div>
          <Button
            variant="secondary"
            onClick={() => parts.append({ description: '', quantity: '1', partNumber: '' })}
          >
            Add part
          </Button>
        </div>
      </fieldset>

      <fieldset className="flex flex-col gap-3">
        <legend className="mb-2 text-lg font-bold">Labour</legend>
        {labour.fields.length === 0 ? <p className="text-ink-muted">No labour lines.</p> : null}
        {labour.fields.map((field, index) => (
          <div
            key={field.id}
            className="grid gap-3 rounded-control border-2 border-line p-3 @lg:grid-cols-[minmax(0,1fr)_7rem] @lg:items-end"
          >
            <TextField
              label={`Operation ${index + 1}`}
              error={errors.labour?.[index]?.operation?.message}
              {...form.register(`labour.${index}.operation`)}
            />
            <TextField
              label={
                <>
                  Hours<span className="sr-only"> for operation {index + 1}</span>
                </>
              }
              inputMode="decimal"
              error={errors.labour?.[index]?.hours?.message}
              {...form.register(`labour.${index}.hours`)}
            />
            <div className="@lg:col-span-2">
              <Button variant="quiet" onClick={() => labour.remove(index)}>
                Remove operation {index + 1}
              </Button>
            </div>
          </div>
        ))}
        <div>
          <Button variant="secondary" onClick={() => labour.append({ operation: '', hours: '' })}>
            Add labour line
          </Button>
        </div>
      </fieldset>

      <fieldset className="flex flex-col gap-3">
        <legend className="mb-2 text-lg font-bold">Follow-ups</legend>
        {followUpHint ? <p className="text-sm text-ink-muted">{followUpHint}</p> : null}
        {followUps.fields.length === 0 ? <p className="text-ink-muted">No follow-ups.</p> : null}
        {followUps.fields.map((field, index) => (
          <div key={field.id} className="flex flex-col gap-2">
            <TextAreaField
              label={`Follow-up ${index + 1}`}
              rows={2}
              className="field-sizing-content min-h-24"
              error={errors.followUps?.[index]?.text?.message}
              {...form.register(`followUps.${index}.text`)}
            />
            <div>
              <Button variant="quiet" onClick={() => followUps.remove(index)}>
                Remove follow-up {index + 1}
              </Button>
            </div>
          </div>
        ))}
        <div>
          <Button variant="secondary" onClick={() => followUps.append({ text: '' })}>
            Add follow-up
          </Button>
        </div>
      </fieldset>
    </>
  );
}
