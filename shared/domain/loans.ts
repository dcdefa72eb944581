/** A loan goes to a borrower; an exhibition is our own show (issue 18). */
export const LOAN_KINDS = ['loan', 'exhibition'] as const;
export type LoanKind = (typeof LOAN_KINDS)[number];

/**
 * Stages in our own words, from proposal to return: proposed, then agreed (conditions
 * signed), away (the prints have left), back (returned); withdrawn ends it early.
 */
export const LOAN_STAGES = ['proposed', 'agreed', 'away', 'back', 'withdrawn'] as const;
export type LoanStage = (typeof LOAN_STAGES)[number];

const NEXT: Record<LoanStage, readonly LoanStage[]> = {
  proposed: ['agreed', 'withdrawn'],
  agreed: ['away', 'proposed', 'withdrawn'],
  away: ['back'],
  back: [],
  withdrawn: [],
};

/** Whether a loan may go from one stage to the other. */
export function mayMoveStage(from: LoanStage, to: LoanStage): boolean {
  return NEXT[from].includes(to);
}

/** Stages of a loan still under way: planned, agreed or with the prints away. */
export const OPEN_STAGES: readonly LoanStage[] = ['proposed', 'agreed', 'away'];

/** Stages whose display periods count in a print's light dose (committed or done). */
export const DOSE_STAGES: readonly LoanStage[] = ['agreed', 'away', 'back'];
