"use client";

import { useState } from "react";
import { commentSchema } from "@/lib/review/review-schema";
import type { CommentView } from "@/lib/server/review";
import { Button } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { describeError, FetchError, sendJson } from "@/lib/client/fetcher";
import { targetText } from "@/components/review/review-words";
import { useFormat } from "@/components/format/format-provider";

// The review's comment thread: each comment about the whole layout, a board or one input, and the form to add one.

export function Comments({
  layoutId,
  comments,
  boards,
  boardName,
  canComment,
  onAdded,
}: {
  layoutId: number;
  comments: CommentView[];
  boards: { key: string; name: string; inputs: number }[];
  boardName: (key: string) => string;
  canComment: boolean;
  onAdded: (c: CommentView) => void;
}) {
  const fmt = useFormat();
  const [body, setBody] = useState("");
  const [boardKey, setBoardKey] = useState("");
  const [input, setInput] = useState("");
  const [error, setError] = useState<string | null>(null);
  const [bodyError, setBodyError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const board = boards.find((b) => b.key === boardKey);

  async function add(e: React.FormEvent) {
    e.preventDefault();
    setBusy(true);
    setError(null);
    const target = !boardKey ? undefined : input ? { kind: "input", boardKey, input: Number(input) } : { kind: "board", boardKey };
    const parsed = commentSchema.safeParse({ body, ...(target ? { target } : {}) });
    setBodyError(parsed.success ? null : parsed.error.issues.filter((i) => i.path[0] === "body").map((i) => i.message).join("; ") || null);
    if (!parsed.success) {
      const other = parsed.error.issues.filter((i) => i.path[0] !== "body");
      if (other.length) setError(other.map((i) => i.message).join("; "));
      setBusy(false);
      return;
    }
    try {
      const r = await sendJson<{ comment: CommentView }>(`/api/layouts/${layoutId}/comments`, "POST", parsed.data);
      onAdded(r.comment);
      setBody("");
    } catch (err) {
      setError(err instanceof FetchError && err.unreachable ? "The server could not be reached; the comment was not saved." : describeError(err));
    } finally {
      setBusy(false);
    }
  }

  return (
    <Card>
      <h2 className="text-lg font-semibold">Comments</h2>
      {comments.length === 0 ? <p className="mt-2 text-sm text-slate-600">No comments yet.</p> : null}
      <ol className="mt-2 space-y-3" data-testid="comments">
        {comments.map((c) => {
          const about = targetText(c.target, boardName);
          return (
            <li key={c.id} className="rounded-md border border-line bg-paper p-2 text-sm">
              <p className="text-xs text-slate-500">
                {c.author ?? "A former member"} · revision {c.revision} · {fmt.dateTime(c.createdAt)}
                {about ? ` · about ${about}` : ""}
              </p>
              <p className="mt-1 whitespace-pre-wrap">{c.body}</p>
            </li>
          );
        })}
      </ol>
      {canComment ? (
        <form onSubmit={add} className="mt-3 flex flex-col gap-2 text-sm">
          <label className="block">
            <span className="font-medium">Add a comment</span>
            <textarea
              required
              maxLength={4000}
              rows={3}
              aria-invalid={!!bodyError}
              className={`mt-1 block w-full rounded-md border bg-white px-3 py-2 ${bodyError ? "border-fault" : "border-line"}`}
              value={body}
              onChange={(e) => setBody(e.target.value)}
            />
            {bodyError ? <span className="mt-1 block text-xs text-fault">{bodyError}</span> : null}
          </label>
          <div className="flex flex-wrap items-end gap-2">
            <label className="block">
              <span className="text-xs text-slate-600">About</span>
              <select className="mt-1 block rounded-md border border-line bg-white px-2 py-1.5" value={boardKey} onChange={(e) => (setBoardKey(e.target.value), setInput(""))}>
                <option value="">the whole layout</option>
                {boards.map((b) => (
                  <option key={b.key} value={b.key}>
                    {b.name}
                  </option>
                ))}
              </select>
            </label>
            {board ? (
              <label className="block">
                <span className="text-xs text-slate-600">Input</span>
                <select className="mt-1 block rounded-md border border-line bg-white px-2 py-1.5" value={input} onChange={(e) => setInput(e.target.value)}>
                  <option value="">the whole board</option>
                  {Array.from({ length: board.inputs }, (_, i) => (
                    <option key={i + 1} value={i + 1}>
                      input {i + 1}
                    </option>
                  ))}
                </select>
              </label>
            ) : null}
            <Button type="submit" disabled={busy || !body.trim()}>
              {busy ? "Saving…" : "Comment"}
            </Button>
          </div>
          {error ? <p className="text-sm font-medium text-fault">{error}</p> : null}
        </form>
      ) : null}
    </Card>
  );
}
