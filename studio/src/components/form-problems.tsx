import { Alert } from '@mantine/core';

interface FormProblemsProps {
  /** What the API said against the form that belongs to no single field (lib/form-errors.ts splitApiErrors). */
  messages: readonly string[] | string | null;
  /** What did not happen, e.g. "The part was not saved". */
  title?: string;
}

/** The form's problems above its fields, read out by screen readers; nothing when there are none. */
export function FormProblems({ messages, title }: FormProblemsProps) {
  const text = typeof messages === 'string' ? messages : (messages ?? []).join(' ');
  if (!text) return null;
  return (
    <Alert color="red" title={title} role="alert">
      {text}
    </Alert>
  );
}
