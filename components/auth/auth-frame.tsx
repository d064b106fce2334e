import type { ReactNode } from "react";

/** The frame of the signed-out pages: the name, a title, the content. */
export function AuthFrame({ title, children, wide = false }: { title: string; children: ReactNode; wide?: boolean }) {
  return (
    <main className="flex min-h-screen items-center justify-center p-6">
      <div className={`w-full ${wide ? "max-w-md" : "max-w-sm"}`}>
        <p className="mb-2 text-center text-3xl font-semibold tracking-tight">Loopwright</p>
        <h1 className="mb-6 text-center text-lg text-slate-700">{title}</h1>
        {children}
      </div>
    </main>
  );
}

export function FormMessage({ error }: { error: string | null }) {
  return error ? (
    <p role="alert" className="rounded-md bg-fault-soft px-3 py-2 text-sm text-fault">
      {error}
    </p>
  ) : null;
}
