import { NextResponse } from "next/server";
import { attachmentHeader } from "@/lib/http/content-disposition";
import { outboxAllowed, outboxAttachment } from "@/lib/server/outbox";

export const dynamic = "force-dynamic";

const notFound = () => NextResponse.json({ error: "Nothing was found at that address." }, { status: 404, headers: { "cache-control": "private, no-store" } });

// GET /dev/outbox/:mailId/attachments/:index — development only (see outboxAllowed): an attachment the fake SMTP server received
export async function GET(_req: Request, { params }: { params: Promise<{ mailId: string; index: string }> }) {
  if (!(await outboxAllowed())) return notFound();
  const { mailId, index } = await params;
  const a = await outboxAttachment(Number(mailId), Number(index));
  if (!a) return notFound();
  return new NextResponse(new Uint8Array(Buffer.from(a.contentBase64, "base64")), {
    headers: { "content-type": a.contentType, "content-disposition": attachmentHeader(a.filename), "x-content-type-options": "nosniff", "cache-control": "private, no-store" },
  });
}
