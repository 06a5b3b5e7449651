export const CAUTION =
  "A research and teaching analysis tool. It is not for regulatory reporting, UV-exposure or health advice, or operational forecasts; for any decision defer to official scientific assessments and to local rules and licensed practice.";

export function SiteFooter({ engineVersion }: { engineVersion: string }) {
  return (
    <footer className="no-print mt-10 border-t border-stone-300 px-4 py-4 text-xs text-slate-600">
      <p className="mx-auto max-w-7xl" data-testid="caution">
        {CAUTION} Engine {engineVersion}.
      </p>
    </footer>
  );
}
