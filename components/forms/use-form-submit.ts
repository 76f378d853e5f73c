"use client";
// A form that sends once at a time: the pending flag, the error in words, and nothing typed lost.
import { useState, type FormEvent } from "react";

type Options = { onError?: (err: unknown) => void; initialError?: string | null };

/** `action` throws to fail; its message is what the person reads. */
export function useFormSubmit(action: (form: FormData) => Promise<void>, { onError, initialError = null }: Options = {}) {
  const [pending, setPending] = useState(false);
  const [error, setError] = useState<string | null>(initialError);

  async function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    setPending(true);
    setError(null);
    try {
      await action(new FormData(event.currentTarget));
    } catch (err) {
      setError(err instanceof Error ? err.message : "Something went wrong");
      onError?.(err);
    } finally {
      setPending(false);
    }
  }

  return { onSubmit, pending, setPending, error, setError };
}
