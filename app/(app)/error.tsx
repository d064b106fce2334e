"use client";

export default function AppError({ reset }: { error: Error; reset: () => void }) {
  return (
    <div role="alert" className="mx-auto mt-12 max-w-xl rounded-lg border border-fault bg-fault-soft p-6">
      <h1 className="text-lg font-semibold text-fault">This page could not be shown</h1>
      <p className="mt-2 text-sm">Something failed on our side or the database is not answering. Nothing you saved is lost.</p>
      <button type="button" onClick={reset} className="mt-4 rounded-md bg-fault px-3 py-2 text-sm text-white">
        Try again
      </button>
    </div>
  );
}
