"use client";

/** The error boundary of every page: a failure that is not an unknown id (e.g. the store cannot be read) answers 500. */
export default function PageError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <div className="mx-auto max-w-xl px-4 py-16">
      <h1 className="text-2xl font-semibold">Something went wrong on our side</h1>
      <p className="mt-3 text-stone-700">
        The page could not be built: something failed on the server, such as reading the stored record. Your link is not
        at fault; try again in a moment.
      </p>
      {error.digest ? (
        <p className="mt-3 text-[13px] text-stone-600">
          Reference for the operator: <span className="font-mono">{error.digest}</span>
        </p>
      ) : null}
      <p className="mt-6">
        <button type="button" className="underline" onClick={reset}>
          Try again
        </button>
      </p>
    </div>
  );
}
