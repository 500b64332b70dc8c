import { useEffect, useState } from 'react';
import { useSearchParams } from 'react-router';
import { formFromQuery, formToQuery, type JointFormState } from './joint-form';

/**
 * The form's state, read once from the query string and written back to it as the builder types.
 * The text lives in React state rather than in the URL so that typing never waits on the router;
 * the URL is replaced, not pushed, so the back button leaves the page instead of undoing keys.
 */
export function useJointForm(): [JointFormState, (next: JointFormState) => void] {
  const [searchParams, setSearchParams] = useSearchParams();
  const [form, setForm] = useState(() => formFromQuery(searchParams));
  const query = formToQuery(form).toString();

  useEffect(() => {
    if (searchParams.toString() !== query) {
      setSearchParams(new URLSearchParams(query), { replace: true, preventScrollReset: true });
    }
  }, [query, searchParams, setSearchParams]);

  return [form, setForm];
}
