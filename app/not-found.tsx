import Link from "next/link";

export default function NotFound() {
  return (
    <main className="mx-auto mt-16 max-w-md text-center">
      <h1 className="text-2xl font-semibold">Not found</h1>
      <p className="mt-2 text-sm text-slate-600">Nothing is here, or it belongs to another organisation.</p>
      <Link href="/" className="mt-4 inline-block text-signal underline">
        Back to sites
      </Link>
    </main>
  );
}
