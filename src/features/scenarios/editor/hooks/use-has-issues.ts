// Whether anything under a path has a problem, so list rows and section tabs can point at it.
import { useFormState, type FieldPath } from 'react-hook-form';
import { useEditor, type ScenarioForm } from '../editor-context';
import { errorAt, flattenErrors } from '../utils/paths';

export function useIssueCount(prefix: string): number {
  const { errors } = useFormState<ScenarioForm>({ name: prefix as FieldPath<ScenarioForm> });
  const { externalIssues } = useEditor();
  let node: unknown = errors;
  for (const key of prefix.split('.'))
    node = typeof node === 'object' && node !== null ? (node as Record<string, unknown>)[key] : undefined;
  const own =
    typeof node === 'object' && node !== null
      ? flattenErrors(node as never).length || (errorAt(errors, prefix) ? 1 : 0)
      : 0;
  const outside = Object.keys(externalIssues).filter((path) => path === prefix || path.startsWith(`${prefix}.`)).length;
  return own + outside;
}
