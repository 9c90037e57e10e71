/** A field's problem, beside the field; the field points at it with aria-describedby. */
export function ProblemNote({ id, problem }: { id: string; problem: string | undefined }) {
  if (problem === undefined) return null;
  return (
    <p id={id} class="problem" role="alert">
      {problem}
    </p>
  );
}

/** The ids a field is described by: its hint, and its problem while it has one. */
export function describedBy(problem: string | undefined, problemId: string, hintId?: string): string | undefined {
  const ids = [hintId, problem === undefined ? undefined : problemId].filter((id) => id !== undefined);
  return ids.length === 0 ? undefined : ids.join(' ');
}
