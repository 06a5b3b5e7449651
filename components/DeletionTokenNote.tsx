"use client";
/**
 * Shows a record's deletion token once, with what it is for. The token comes
 * from the creating response, or from the address fragment (#deletion-token=…)
 * when the creator moved on to the record's page: a fragment is never sent to
 * a server nor in a Referer; it is removed from the address once read.
 */
import { useEffect, useState } from "react";

interface Props {
  /** the token, when the component is given it directly */
  token?: string;
  /** what DELETE with the token removes, e.g. "this assessment (both links)" */
  what: string;
  /** the API URL to DELETE */
  deleteUrl: string;
}

export function DeletionTokenNote({ token: given, what, deleteUrl }: Props) {
  const [token, setToken] = useState(given ?? null);
  useEffect(() => {
    if (given) return;
    const m = /(?:^#|&)deletion-token=([A-Za-z0-9_-]{43})/.exec(window.location.hash);
    if (!m) return;
    setToken(m[1]);
    history.replaceState(null, "", window.location.pathname + window.location.search);
  }, [given]);
  if (!token) return null;
  return (
    <div
      data-testid="deletion-token"
      className="rounded border border-amber-300 bg-amber-50 px-3 py-2 text-[12px] text-amber-950"
    >
      <p>
        <strong>Deletion token</strong> (shown only once; keep it somewhere safe):{" "}
        <code className="select-all break-all font-mono">{token}</code>
      </p>
      <p className="mt-0.5">
        With it you can delete {what}: send <code>DELETE {deleteUrl}</code> with the header{" "}
        <code>x-deletion-token</code>. Afterwards the links answer “gone”. Without it nobody can delete it.
      </p>
    </div>
  );
}
