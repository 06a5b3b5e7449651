"use client";
/** Opens the browser's print dialogue (print to PDF for a file). */
export function PrintButton({ label = "Print" }: { label?: string }) {
  return (
    <button
      type="button"
      onClick={() => window.print()}
      className="no-print rounded bg-stone-900 px-4 py-2 text-[13px] font-medium text-white hover:bg-stone-700 focus:outline-2 focus:outline-offset-2"
    >
      {label}
    </button>
  );
}
