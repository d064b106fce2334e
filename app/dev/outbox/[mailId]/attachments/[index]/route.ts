import { NextResponse } from "next/server";
import { env } from "@/lib/server/env";
import { outboxAttachment } from "@/lib/server/outbox";

// GET /dev/outbox/:mailId/attachments/:index — development only: download an attachment the fake SMTP server received
export async function GET(_req: Request, { params }: { params: Promise<{ mailId: string; index: string }> }) {
  if (env().LOOPWRIGHT_DEV_OUTBOX !== "1") return NextResponse.json({ error: "Not found." }, { status: 404 });
  const { mailId, index } = await params;
  const a = await outboxAttachment(Number(mailId), Number(index));
  if (!a) return NextResponse.json({ error: "Not found." }, { status: 404 });
  return new NextResponse(new Uint8Array(Buffer.from(a.contentBase64, "base64")), {
    headers: { "content-type": a.contentType, "content-disposition": `attachment; filename="${a.filename.replace(/[^\w.-]/g, "_")}"` },
  });
}
