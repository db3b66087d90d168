import type { DeskIssues, FieldKey } from '../_lib/field-paths';
import { inputIdOf } from '../_lib/steps';

/** Every problem with a link to its field: the keyboard route from the summary to the fix. */
export function IssueList({ issues, testId }: { issues: DeskIssues; testId: string }) {
  const entries = Object.entries(issues.fields) as [FieldKey, string][];
  if (!entries.length && !issues.general.length) return null;
  return (
    <ul data-testid={testId} className="space-y-1 text-sm">
      {entries.map(([key, message]) => (
        <li key={key}>
          <a
            href={`#${inputIdOf(key)}`}
            className="text-severity-danger underline decoration-dotted underline-offset-2"
          >
            {message}
          </a>
        </li>
      ))}
      {issues.general.map((m) => (
        <li key={m} className="text-severity-danger">
          {m}
        </li>
      ))}
    </ul>
  );
}
