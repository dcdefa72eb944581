import clsx from 'clsx';
import { GRADE_DEFINITIONS, type ConditionGrade } from '@shared/domain/condition';

const TONES: Record<ConditionGrade, string> = {
  sound: 'bg-ok-light text-ok',
  settled: 'bg-paper-deep text-ink-soft',
  vulnerable: 'bg-gall-light text-gall-dark',
  'needs treatment': 'bg-alert-light text-alert',
};

/** The grade in words, its definition on hover and for screen readers. */
export function GradeMark({ grade }: { grade: ConditionGrade }) {
  return (
    <span
      title={GRADE_DEFINITIONS[grade]}
      className={clsx('rounded-full px-2 py-0.5 text-xs font-medium', TONES[grade])}
    >
      {grade}
    </span>
  );
}
