// A formula box (a branch condition or a computed value) checked as it is typed with the same
// fault-tree code that validates and walks the tree: names it does not know and mixed-up units are
// said in words under the box, and when it reads well it is worked out on sample values the lead
// types for the names it uses.
import {
  checkFormula,
  formatWithUnit,
  listFormulaFunctions,
  type FormulaCheck,
  type Quantity,
} from '@heatpath/fault-tree';
import { useId, useMemo } from 'react';
import { FieldError, TextField } from '../../../components/ui/field';
import { pathKey } from '../draft-model';
import { readNumber } from '../../../lib/read-number';
import { canonicalUnit, quantityLabels, unitLabel } from '../units-format';
import type { ErrorAt, Path } from './editor-fields';

export type Samples = Readonly<Record<string, string>>;

interface FormulaFieldProps {
  label: string;
  value: string;
  onChange: (value: string) => void;
  expect: 'condition' | Quantity;
  /** Every name formulas in this tree may use, with its quantity. */
  names: Readonly<Record<string, Quantity>>;
  samples: Samples;
  onSampleChange: (name: string, text: string) => void;
  path: Path;
  errorAt: ErrorAt;
}

const functionNames = listFormulaFunctions()
  .map((help) => help.name)
  .join(', ');

export function FormulaField({
  label,
  value,
  onChange,
  expect,
  names,
  samples,
  onSampleChange,
  path,
  errorAt,
}: FormulaFieldProps) {
  const fieldId = useId();
  const checkId = `${fieldId}-check`;
  const check = useMemo((): FormulaCheck | null => {
    if (!value.trim()) return null;
    try {
      return checkFormula(value, { names, expect });
    } catch {
      // Only an unknown quantity (from an imported file) gets here; validation names it.
      return {
        ok: false,
        problems: [
          {
            code: 'formula-syntax',
            message: 'This formula cannot be checked until its quantity is fixed.',
          },
        ],
      };
    }
  }, [value, names, expect]);

  const scope: Record<string, number> = {};
  if (check?.ok) {
    for (const name of check.namesUsed) {
      const number = readNumber(samples[name] ?? '');
      if (number !== null && !Number.isNaN(number)) scope[name] = number;
    }
  }
  const evaluation = check?.ok ? check.evaluate(scope) : null;
  const wanted = expect === 'condition' ? 'a yes/no result' : quantityLabels[expect].toLowerCase();
  // The tree-wide check repeats what this box already says; show it only when the box is happy.
  const treeProblem = check && !check.ok ? undefined : errorAt(path);

  return (
    <div className="flex flex-col gap-2">
      <TextField
        label={label}
        hint={
          expect === 'condition'
            ? 'A yes/no formula over readings and computed values, such as reading > 105 or a >= 0.9 * b. A number may carry a unit: 15 psi, 221 degF.'
            : `Gives ${wanted}. Functions: ${functionNames}.`
        }
        value={value}
        spellCheck={false}
        autoComplete="off"
        className="font-mono"
        id={fieldId}
        data-path={pathKey(path)}
        aria-describedby={[`${fieldId}-hint`, treeProblem ? `${fieldId}-error` : '', checkId]
          .filter(Boolean)
          .join(' ')}
        error={treeProblem}
        onChange={(event) => onChange(event.target.value)}
      />
      <div id={checkId} aria-live="polite" className="flex flex-col gap-2">
        {check === null ? null : check.ok ? (
          <div className="flex flex-col gap-3 rounded-control bg-sunken px-3 py-3">
            <p className="flex items-start gap-2 font-semibold text-ok-ink">
              <span aria-hidden="true">✓</span>
              <span>
                Formula reads well: it gives {check.result}
                {check.namesUsed.length > 0 ? `, from ${check.namesUsed.join(', ')}` : ''}.
              </span>
            </p>
            {check.namesUsed.length > 0 ? (
              <fieldset className="flex flex-col gap-2">
                <legend className="mb-1 font-semibold">Try it on sample values</legend>
                <div className="grid gap-3 sm:grid-cols-2">
                  {check.namesUsed.map((name) => {
                    const quantity = names[name];
                    return (
                      <TextField
                        key={name}
                        label={`Sample ${name}`}
                        inputMode="decimal"
                        autoComplete="off"
                        value={samples[name] ?? ''}
                        suffix={quantity ? unitLabel(canonicalUnit(quantity)) : undefined}
                        onChange={(event) => onSampleChange(name, event.target.value)}
                      />
                    );
                  })}
                </div>
              </fieldset>
            ) : null}
            <p>
              <span className="font-semibold">On these values: </span>
              {evaluation?.ok ? (
                typeof evaluation.value === 'boolean' ? (
                  evaluation.value ? (
                    <span className="font-bold">holds (true)</span>
                  ) : (
                    <span className="font-bold">does not hold (false)</span>
                  )
                ) : (
                  <span className="font-bold">
                    {expect === 'condition'
                      ? String(evaluation.value)
                      : formatWithUnit(evaluation.value, canonicalUnit(expect))}
                  </span>
                )
              ) : evaluation?.missing ? (
                <span className="text-ink-muted">waiting for a sample {evaluation.missing}</span>
              ) : (
                <span className="text-ink-muted">{evaluation?.reason ?? 'no value'}</span>
              )}
            </p>
          </div>
        ) : (
          <div className="flex flex-col gap-1">
            {check.problems.map((problem, index) => (
              <FieldError key={index} id={`${checkId}-${index}`} message={problem.message} />
            ))}
          </div>
        )}
      </div>
    </div>
  );
}
