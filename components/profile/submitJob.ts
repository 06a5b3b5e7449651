/** POSTs a job-starting request and returns the job id, or throws with the server's message and the field it names. */
export async function submitJob(url: string, body: unknown): Promise<string> {
  const r = await fetch(url, {
    method: "POST",
    headers: { "content-type": "application/json" },
    body: JSON.stringify(body),
  });
  const out = await r.json().catch(() => null);
  if (r.status !== 202 || !out?.id) {
    const e = out?.error;
    throw new Error(e?.message ?? `the server answered ${r.status}`);
  }
  return out.id as string;
}
