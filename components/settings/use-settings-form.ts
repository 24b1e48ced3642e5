import type { UseMutationResult } from '@tanstack/react-query';
import { useEffect, useState } from 'react';

type Built<Body> = { ok: true; body: Body } | { ok: false; errors: Record<string, string> };

interface Options<Data, Draft, Body> {
  /** What the server holds; the form starts from it once it arrives. */
  data: Data | undefined;
  draftOf(data: Data): Draft;
  /** Validates the draft with the server's own schema; errors keyed by field path. */
  bodyOf(draft: Draft): Built<Body>;
  save: UseMutationResult<Data, Error, Body>;
}

/** An admin settings form: the draft, its errors by path, "saved", and Save (the draft follows what the server answered). */
export function useSettingsForm<Data, Draft, Body>({ data, draftOf, bodyOf, save }: Options<Data, Draft, Body>) {
  const [draft, setDraft] = useState<Draft | null>(null);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [saved, setSaved] = useState(false);

  useEffect(() => {
    if (data && !draft) setDraft(draftOf(data));
  }, [data, draft, draftOf]);

  const edit = (next: Draft) => (setDraft(next), setSaved(false));
  // A field's message goes once it is retyped; the save checks everything again.
  const clearError = (key: string) => errors[key] && setErrors(({ [key]: _gone, ...rest }) => rest);
  const onSave = () => {
    if (!draft) return;
    const built = bodyOf(draft);
    setSaved(false);
    if (!built.ok) return setErrors(built.errors);
    setErrors({});
    save.mutate(built.body, { onSuccess: (answer) => (setDraft(draftOf(answer)), setSaved(true)) });
  };
  return { draft, edit, errors, saved, onSave, clearError };
}
