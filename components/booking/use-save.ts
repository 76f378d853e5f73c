"use client";
// One request from a settings form, then a fresh render of the server page.
import { useRouter } from "next/navigation";
import { useState } from "react";
import { apiFetch, ApiClientError } from "@/lib/client/api";

export function useSave() {
  const router = useRouter();
  const [pending, setPending] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const [saved, setSaved] = useState(false);
  async function save(path: string, method: string, body?: unknown): Promise<boolean> {
    setPending(true);
    setError(null);
    setSaved(false);
    try {
      await apiFetch(path, { method, body });
      setSaved(true);
      router.refresh();
      return true;
    } catch (err) {
      setError(err instanceof ApiClientError ? err.message : "Something went wrong");
      return false;
    } finally {
      setPending(false);
    }
  }
  return { save, pending, error, saved };
}
