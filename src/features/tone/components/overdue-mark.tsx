/** The word beside a due date that has passed (tone watch, the check round, the record). */
export function OverdueMark() {
  return <span className="ml-1 rounded bg-alert-light px-1 text-xs text-alert">overdue</span>;
}
