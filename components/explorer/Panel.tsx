/** A titled panel section. */
import type { ReactNode } from "react";

export function Panel({
  title,
  id,
  right,
  children,
  className = "",
}: {
  title: string;
  id: string;
  right?: ReactNode;
  children: ReactNode;
  className?: string;
}) {
  return (
    <section aria-labelledby={id} className={`rounded-md border border-stone-300 bg-white ${className}`}>
      <header className="flex items-center justify-between gap-2 border-b border-stone-200 px-3 py-1.5">
        <h2 id={id} className="text-[13px] font-semibold tracking-wide text-stone-800">
          {title}
        </h2>
        {right}
      </header>
      {children}
    </section>
  );
}
