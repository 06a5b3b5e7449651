import type { APIRequestContext } from "@playwright/test";

/** Polls GET /api/jobs/{id} until the job has ended; its last status. */
export async function finish(request: APIRequestContext, jobId: string) {
  for (let i = 0; i < 600; i++) {
    const s = await (await request.get(`/api/jobs/${jobId}`)).json();
    if (["done", "failed", "cancelled"].includes(s.state)) return s;
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`job ${jobId} did not finish`);
}
