import type { UseFormRegisterReturn } from 'react-hook-form';
import { CONDITION_GRADES, GRADE_DEFINITIONS } from '@shared/domain/condition';

/** The overall grade as radio buttons, each with its definition in words. */
export function GradeField({ field, error }: { field: UseFormRegisterReturn; error?: string }) {
  return (
    <fieldset aria-describedby={error ? 'grade-error' : undefined}>
      <legend className="mb-1 text-lg font-serif">Overall grade</legend>
      <div className="grid gap-2 sm:grid-cols-2">
        {CONDITION_GRADES.map((grade) => (
          <label
            key={grade}
            className="flex gap-2 rounded border border-paper-edge bg-white/60 p-2 text-sm has-[:checked]:border-gall has-[:checked]:bg-gall-light"
          >
            <input type="radio" value={grade} {...field} className="mt-1" />
            <span>
              <span className="font-medium">{grade}</span>
              <span className="block text-ink-soft">{GRADE_DEFINITIONS[grade]}</span>
            </span>
          </label>
        ))}
      </div>
      {error && (
        <p id="grade-error" className="mt-1 text-xs font-medium text-alert">
          {error}
        </p>
      )}
    </fieldset>
  );
}
