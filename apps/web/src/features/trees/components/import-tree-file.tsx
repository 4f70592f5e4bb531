// Import a tree definition file (Heatpath's JSON format). The file is read in the browser and sent
// as it is; the API keeps it as a draft and lists every problem it has, or refuses a file that is
// not a tree at all — and then every problem it found is listed here too.
import type { TreeVersionDetail } from '@heatpath/contracts';
import { useId, useState } from 'react';
import { Link } from 'react-router';
import { Alert } from '../../../components/ui/alert';
import { isApiError } from '../../../lib/api-client';
import { useCreateTree } from '../api/create-tree';
import { problemCount } from '../tree-format';

type Result =
  | { kind: 'imported'; treeId: string; draft: TreeVersionDetail; title: string }
  | { kind: 'refused'; message: string; problems: string[] };

export function ImportTreeFile() {
  const create = useCreateTree();
  const inputId = useId();
  const [result, setResult] = useState<Result | null>(null);
  const [fileName, setFileName] = useState<string | null>(null);

  const importFile = async (file: File) => {
    setFileName(file.name);
    setResult(null);
    let definition: unknown;
    try {
      definition = JSON.parse(await file.text());
    } catch (error) {
      setResult({
        kind: 'refused',
        message: `“${file.name}” is not a JSON file, so it cannot be a Heatpath tree.`,
        problems: [error instanceof Error ? error.message : 'The file could not be read.'],
      });
      return;
    }
    create.mutate(
      { mode: 'import', definition },
      {
        onSuccess: (created) => {
          const definitionTitle = (created.draft.definition as { title?: unknown }).title;
          setResult({
            kind: 'imported',
            treeId: created.treeId,
            draft: created.draft,
            title: typeof definitionTitle === 'string' ? definitionTitle : file.name,
          });
        },
        onError: (error) =>
          setResult({
            kind: 'refused',
            message: error.message,
            problems: isApiError(error) ? Object.values(error.fields) : [],
          }),
      },
    );
  };

  return (
    // display: contents, so the button sits in the library's row of actions and the result
    // below it takes the whole width.
    <div className="contents">
      <div>
        <label
          htmlFor={inputId}
          className="inline-flex min-h-touch-lg cursor-pointer items-center justify-center gap-2 rounded-control border-2 border-line-strong bg-surface px-5 text-lg font-semibold hover:bg-sunken has-focus-visible:outline-3 has-focus-visible:outline-focus"
        >
          {create.isPending ? `Importing ${fileName ?? ''}…` : 'Import a tree file'}
          <input
            id={inputId}
            type="file"
            accept=".json,application/json"
            className="sr-only"
            disabled={create.isPending}
            onChange={(event) => {
              const file = event.target.files?.[0];
              event.target.value = '';
              if (file) void importFile(file);
            }}
          />
        </label>
      </div>
      <div className="w-full empty:hidden">
        {result?.kind === 'imported' ? (
          result.draft.problems.length === 0 ? (
            <Alert tone="ok" title={`Imported “${result.title}”`} role="status">
              <p>It is draft version 1, with no problems: try it, then publish it.</p>
              <p>
                <Link
                  to={`/trees/${result.treeId}/draft`}
                  className="font-semibold underline underline-offset-4"
                >
                  Open the draft
                </Link>
              </p>
            </Alert>
          ) : (
            <Alert
              tone="caution"
              title={`Imported “${result.title}” with ${problemCount(result.draft.problems.length)}`}
              role="status"
            >
              <p>It is kept as draft version 1. Fix these before it can be published:</p>
              <ul aria-label="Problems in the imported file" className="list-disc pl-6">
                {result.draft.problems.map((problem, index) => (
                  <li key={index}>{problem.message}</li>
                ))}
              </ul>
              <p>
                <Link
                  to={`/trees/${result.treeId}/draft`}
                  className="font-semibold underline underline-offset-4"
                >
                  Open the draft
                </Link>
              </p>
            </Alert>
          )
        ) : result?.kind === 'refused' ? (
          <Alert tone="danger" title={`Not imported: ${fileName ?? 'the file'}`} role="alert">
            <p>{result.message}</p>
            {result.problems.length > 0 ? (
              <ul aria-label="Problems in the file" className="list-disc pl-6">
                {result.problems.map((text, index) => (
                  <li key={index}>{text}</li>
                ))}
              </ul>
            ) : null}
          </Alert>
        ) : null}
      </div>
    </div>
  );
}
