import { notFound } from "next/navigation";
import { listOutbox, outboxAllowed } from "@/lib/server/outbox";

export const dynamic = "force-dynamic";

// Development only: what the local fake SMTP server received. A 404 in a production build, without
// LOOPWRIGHT_DEV_OUTBOX=1, and for anyone but a signed-in admin (see outboxAllowed).
export default async function OutboxPage() {
  if (!(await outboxAllowed())) notFound();
  const mails = await listOutbox();
  return (
    <main className="mx-auto max-w-4xl p-6">
      <h1 className="text-2xl font-semibold">Development outbox</h1>
      <p className="mb-6 text-sm text-slate-600">Messages delivered to the local fake SMTP server. Nothing here left this machine.</p>
      {mails.length === 0 ? <p className="text-sm">No messages yet.</p> : null}
      <ol className="space-y-4" data-testid="outbox">
        {mails.map((m) => (
          <li key={m.id} className="rounded-lg border border-line bg-white p-4">
            <p className="text-xs text-slate-500">
              {m.receivedAt} · to {m.to}
            </p>
            <p className="font-semibold">{m.subject}</p>
            <pre className="mt-2 whitespace-pre-wrap break-words font-sans text-sm">{linkify(m.text)}</pre>
            {m.attachments.length ? (
              <ul className="mt-2 text-sm">
                {m.attachments.map((a, i) => (
                  <li key={i}>
                    <a className="text-signal underline" href={`/dev/outbox/${m.id}/attachments/${i}`}>
                      {a.filename}
                    </a>{" "}
                    ({a.contentType}, {Math.round(a.size / 1024)} KiB)
                  </li>
                ))}
              </ul>
            ) : null}
          </li>
        ))}
      </ol>
    </main>
  );
}

function linkify(text: string) {
  return text.split(/(https?:\/\/\S+)/g).map((part, i) =>
    /^https?:\/\//.test(part) ? (
      <a key={i} className="text-signal underline" href={part}>
        {part}
      </a>
    ) : (
      part
    ),
  );
}
