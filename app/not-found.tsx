import Link from "next/link";

export default function NotFound() {
  return (
    <main className="mx-auto flex min-h-screen max-w-md flex-col justify-center gap-4 p-6">
      <p className="text-label uppercase text-slate-600">404</p>
      <h1 className="text-title">This page is not here</h1>
      <p>The link may be old, or the thing it pointed to was removed or is not yours to see.</p>
      <Link href="/" className="btn-quiet self-start">Back to Fitframe</Link>
    </main>
  );
}
