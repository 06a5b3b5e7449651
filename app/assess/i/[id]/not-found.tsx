export default function AssessmentNotFound() {
  return (
    <div className="mx-auto max-w-3xl px-4 py-16">
      <h1 className="text-2xl font-semibold">No such assessment</h1>
      <p className="mt-3 text-stone-700">
        The link is incomplete or was mistyped. Instructor and student links are different; ask the instructor for the
        link again, or{" "}
        <a className="underline" href="/assess">
          build a new assessment
        </a>
        .
      </p>
    </div>
  );
}
