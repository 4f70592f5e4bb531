// A tree from scratch: a title and the symptom it starts from. The API gives it a first question
// and a finding to grow from, and the editor opens on it.
import { useState } from 'react';
import { useNavigate } from 'react-router';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { TextAreaField, TextField } from '../../../components/ui/field';
import { isApiError } from '../../../lib/api-client';
import { useCreateTree } from '../api/create-tree';

export function NewTreeForm({ onCancel }: { onCancel: () => void }) {
  const navigate = useNavigate();
  const create = useCreateTree();
  const [title, setTitle] = useState('');
  const [symptom, setSymptom] = useState('');
  const [tried, setTried] = useState(false);
  const fields = isApiError(create.error) ? create.error.fields : {};
  const titleError =
    fields.title ?? (tried && title.trim().length < 3 ? 'Give the tree a title.' : undefined);
  const symptomError =
    fields.symptom ??
    (tried && symptom.trim().length < 3 ? 'Say which symptom the tree starts from.' : undefined);

  return (
    <form
      aria-label="New tree"
      noValidate
      className="flex flex-col gap-4"
      onSubmit={(event) => {
        event.preventDefault();
        setTried(true);
        if (title.trim().length < 3 || symptom.trim().length < 3) return;
        create.mutate(
          { mode: 'blank', title: title.trim(), symptom: symptom.trim() },
          { onSuccess: (created) => void navigate(`/trees/${created.treeId}/draft`) },
        );
      }}
    >
      <h2 className="text-xl font-bold">New tree</h2>
      <TextField
        label="Title"
        value={title}
        maxLength={160}
        error={titleError}
        onChange={(event) => setTitle(event.target.value)}
      />
      <TextAreaField
        label="Symptom"
        hint="The complaint as the customer or the technician would put it, e.g. “Heater blows cold at idle”."
        rows={2}
        value={symptom}
        maxLength={500}
        error={symptomError}
        onChange={(event) => setSymptom(event.target.value)}
      />
      {create.isError && Object.keys(fields).length === 0 ? (
        <Alert tone="danger" title="Tree not created" role="alert">
          <p>{create.error.message}</p>
        </Alert>
      ) : null}
      <div className="flex flex-wrap gap-3">
        <Button type="submit" busy={create.isPending} busyLabel="Creating…">
          Create tree
        </Button>
        <Button variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
