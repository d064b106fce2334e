"use client";

import { useCallback, useState } from "react";

// The editor's two lines of text: the message of the last edit (announced), and a dismissable notice.

export type EditorMessage = { kind: "ok" | "refused" | "info"; text: string; live: boolean; at: number };
export type Announce = (kind: EditorMessage["kind"], text: string, live?: boolean) => void;

export function useEditorMessage(): { message: EditorMessage | null; announce: Announce } {
  const [message, setMessage] = useState<EditorMessage | null>(null);
  const announce = useCallback<Announce>((kind, text, live = true) => setMessage({ kind, text, live, at: Date.now() }), []);
  return { message, announce };
}

export interface CopyLink {
  id: number;
  name: string;
}

export interface Notice {
  text: string | null;
  /** The layout the notice points to, when it names one. */
  copyLink: CopyLink | null;
  show: (text: string, copyLink?: CopyLink | null) => void;
  dismiss: () => void;
}

export function useNotice(initial: string | null): Notice {
  const [text, setText] = useState<string | null>(initial);
  const [copyLink, setCopyLink] = useState<CopyLink | null>(null);
  const show = useCallback((t: string, link: CopyLink | null = null) => {
    setText(t);
    setCopyLink(link);
  }, []);
  const dismiss = useCallback(() => {
    setText(null);
    setCopyLink(null);
  }, []);
  return { text, copyLink, show, dismiss };
}
