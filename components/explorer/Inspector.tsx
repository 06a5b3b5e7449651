/**
 * Details of the selected species or reaction: amounts, lifetime, production
 * and loss by reaction for a species; equation, k at these conditions, rate,
 * rate-law parameters and their source for a reaction.
 */

import { familyOf } from "@/lib/analysis/familyOf";
import type { AnalysisResult } from "@/lib/engine/types";
import type { RateLaw } from "@/lib/kinetics/types";
import { PHOTOLYSIS_CHANNELS } from "@/lib/photolysis/channels";
import { equationView } from "@/lib/viz/equationView";
import { familyLabel } from "@/lib/viz/familyLabel";
import { formatLifetime, formatMixingRatio, formatNumber, formatPercent } from "@/lib/viz/formatNumber";
import { type SpeciesTerm, speciesBudget } from "@/lib/viz/speciesBudget";
import type { MechanismView } from "@/lib/viz/types";

interface Props {
  selected: string;
  mechanism: MechanismView;
  result: AnalysisResult | null;
  onSelect(id: string | null): void;
}

export function Inspector({ selected, mechanism, result, onSelect }: Props) {
  const [kind, id] = [selected.slice(0, 2), selected.slice(2)];
  return (
    <aside
      data-testid="inspector"
      aria-label="Inspector"
      className="pointer-events-auto flex max-h-full w-[330px] flex-col rounded-md border border-stone-300 bg-white/97 text-[12px] shadow-md"
    >
      <header className="flex items-center justify-between border-b border-stone-200 px-3 py-1.5">
        <h2 className="text-[13px] font-semibold text-stone-800">{kind === "s:" ? "Species" : "Reaction"}</h2>
        <button
          type="button"
          onClick={() => onSelect(null)}
          className="rounded px-1.5 text-stone-500 hover:bg-stone-100 hover:text-stone-900 focus:outline-2 focus:outline-stone-800"
          aria-label="Close the inspector"
        >
          ✕
        </button>
      </header>
      <div className="min-h-0 overflow-y-auto px-3 py-2">
        {kind === "s:" ? (
          <SpeciesDetails id={id} mechanism={mechanism} result={result} onSelect={onSelect} />
        ) : (
          <ReactionDetails id={id} mechanism={mechanism} result={result} onSelect={onSelect} />
        )}
      </div>
    </aside>
  );
}

function Row({ label, children }: { label: string; children: React.ReactNode }) {
  return (
    <div className="flex justify-between gap-3 py-0.5">
      <dt className="text-stone-500">{label}</dt>
      <dd className="text-right tabular-nums text-stone-900">{children}</dd>
    </div>
  );
}

function SpeciesDetails({ id, mechanism, result, onSelect }: { id: string } & Omit<Props, "selected">) {
  const sp = mechanism.species.find((s) => s.id === id);
  const st = result?.steadyState.species.find((s) => s.id === id);
  if (!sp) return <p className="text-stone-500">{id} is not in this mechanism.</p>;
  const b = result ? speciesBudget(id, result.steadyState.reactions) : null;
  return (
    <>
      <p className="text-[15px] font-semibold text-stone-900">
        <bdi>{sp.label}</bdi>
      </p>
      <p className="text-stone-500">
        {familyLabel(familyOf(sp))} · {sp.role === "held" ? "held at a fixed amount" : "solved for steady state"}
      </p>
      <dl className="mt-2">
        <Row label="number density">{st ? `${formatNumber(st.numberDensity_cm3)} cm⁻³` : "—"}</Row>
        <Row label="mixing ratio">{formatMixingRatio(st?.mixingRatio)}</Row>
        <Row label="lifetime (chemical)">{formatLifetime(st?.lifetime_s)}</Row>
        <Row label="production">{st ? `${formatNumber(st.production_cm3s)} cm⁻³ s⁻¹` : "—"}</Row>
        <Row label="loss">{st ? `${formatNumber(st.loss_cm3s)} cm⁻³ s⁻¹` : "—"}</Row>
      </dl>
      {b ? (
        <>
          <Terms title="Produced by" terms={b.production} onSelect={onSelect} />
          <Terms title="Lost by" terms={b.loss} onSelect={onSelect} />
        </>
      ) : null}
    </>
  );
}

function Terms({ title, terms, onSelect }: { title: string; terms: SpeciesTerm[]; onSelect(id: string): void }) {
  const shown = terms.slice(0, 8);
  return (
    <div className="mt-2">
      <h3 className="text-[11px] font-semibold uppercase tracking-wider text-stone-500">
        {title} <span className="font-normal normal-case">(molecules cm⁻³ s⁻¹)</span>
      </h3>
      {shown.length === 0 ? (
        <p className="text-stone-500">none</p>
      ) : (
        <ul>
          {shown.map((t) => (
            <li key={t.reactionId} className="py-0.5">
              <button
                type="button"
                onClick={() => onSelect(`r:${t.reactionId}`)}
                className="flex w-full items-baseline justify-between gap-2 rounded text-left hover:bg-stone-100 focus:outline-2 focus:outline-stone-800"
              >
                <span className="truncate">{t.equation}</span>
                <span className="shrink-0 tabular-nums">
                  {formatNumber(t.rate_cm3s)} <span className="text-stone-500">{formatPercent(t.share)}</span>
                </span>
              </button>
            </li>
          ))}
          {terms.length > shown.length ? (
            <li className="text-stone-500">and {terms.length - shown.length} smaller</li>
          ) : null}
        </ul>
      )}
    </div>
  );
}

/** Units of the effective rate coefficient from the number of reactant molecules. */
function kUnit(equation: string): string {
  const eq = equationView(equation);
  if (eq.photolysis) return "s⁻¹";
  const order = eq.reactants.reduce((s, t) => s + t.coef, 0);
  if (order <= 1) return "s⁻¹";
  if (order === 2) return "cm³ molecule⁻¹ s⁻¹";
  return `cm${3 * (order - 1)} molecule⁻${order - 1} s⁻¹`.replace("cm6", "cm⁶").replace("⁻2", "⁻²");
}

function lawRows(rate: RateLaw): [string, string][] {
  switch (rate.law) {
    case "arrhenius":
      return [
        ["law", "Arrhenius k = A (T/300)^b exp(−E/RT)"],
        ["A", formatNumber(rate.A)],
        ["E/R", `${formatNumber(rate.EoverR_K)} K`],
        ...(rate.b ? ([["b", String(rate.b)]] as [string, string][]) : []),
      ];
    case "termolecular":
      return [
        ["law", "termolecular (falloff)"],
        ["k0(300)", `${formatNumber(rate.k0_300)} cm⁶ molecule⁻² s⁻¹`],
        ["n", String(rate.n)],
        ...(rate.kinf_300 !== undefined
          ? ([
              ["k∞(300)", `${formatNumber(rate.kinf_300)} cm³ molecule⁻¹ s⁻¹`],
              ["m", String(rate.m ?? 0)],
            ] as [string, string][])
          : []),
        ["Fc", String(rate.Fc ?? 0.6)],
      ];
    case "chemical-activation":
      return [
        ["law", "chemical activation"],
        ["k0(300)", formatNumber(rate.k0_300)],
        ["n", String(rate.n)],
        ["k∞(300)", formatNumber(rate.kinf_300)],
        ["m", String(rate.m)],
        ["Fc", String(rate.Fc ?? 0.6)],
      ];
    case "equilibrium-reverse":
      return [
        ["law", "reverse of an equilibrium: k = k_f / K(T)"],
        ["K(T) = A exp(B/T): A", `${formatNumber(rate.Keq_A_cm3)} cm³ molecule⁻¹`],
        ["B", `${formatNumber(rate.Keq_B_K)} K`],
        ...lawRows(rate.forward).map(([k, v]) => [`forward ${k}`, v] as [string, string]),
      ];
    case "photolysis":
      return [
        ["law", "photolysis"],
        ["channel", rate.channel],
        ...(rate.factor !== undefined ? ([["factor", String(rate.factor)]] as [string, string][]) : []),
      ];
    case "photolysis-fixed":
      return [
        ["law", "fixed photolysis frequency"],
        ["J", `${formatNumber(rate.J_s)} s⁻¹`],
      ];
    case "uptake":
      return [
        ["law", `uptake on ${rate.surface ?? "sulfate"}, γ v̄ A / 4`],
        ["γ", rate.partner ? `${rate.gamma}, limited by the ${rate.partner.species} that arrives` : String(rate.gamma)],
        ["molar mass", `${formatNumber(rate.molarMass_gmol)} g mol⁻¹`],
      ];
    case "liquid-aerosol":
      return [
        ["law", "uptake on liquid sulfate, γ(T, H2O, HCl) after Shi et al. 2001"],
        ["process", rate.process],
        ["molar mass", `${formatNumber(rate.molarMass_gmol)} g mol⁻¹`],
      ];
    default:
      return [];
  }
}

function ReactionDetails({ id, mechanism, result, onSelect }: { id: string } & Omit<Props, "selected">) {
  const rx = mechanism.reactions.find((r) => r.id === id);
  const st = result?.steadyState.reactions.find((r) => r.id === id);
  const ox = result?.cycles.perReaction.find((r) => r.reactionId === id);
  if (!rx) return <p className="text-stone-500">{id} is not in this mechanism.</p>;
  const inCycles = result?.cycles.cycles.filter((c) => c.steps.some((s) => s.reactionId === id)) ?? [];
  const eq = equationView(rx.equation);
  return (
    <>
      <p className="text-[14px] font-semibold text-stone-900">{rx.equation}</p>
      <p className="text-stone-500">
        id <bdi>{rx.id}</bdi>
      </p>
      <dl className="mt-2">
        <Row label="k at these conditions">{st ? `${formatNumber(st.k)} ${kUnit(rx.equation)}` : "—"}</Row>
        <Row label="rate">{st ? `${formatNumber(st.rate_cm3s)} cm⁻³ s⁻¹` : "—"}</Row>
        {ox ? (
          <>
            <Row label="own Ox change">{`${formatNumber(ox.netOxChange_cm3s)} cm⁻³ s⁻¹`}</Row>
            <Row label="Ox destroyed via its cycles">{`${formatNumber(ox.oxDestroyed_cm3s)} cm⁻³ s⁻¹`}</Row>
          </>
        ) : null}
      </dl>
      <h3 className="mt-2 text-[11px] font-semibold uppercase tracking-wider text-stone-500">Parameters</h3>
      <dl>
        {lawRows(rx.rate).map(([k, v]) => (
          <Row key={k} label={k}>
            {v}
          </Row>
        ))}
        {rx.uncertainty ? (
          <Row label="uncertainty">{`f(298) = ${rx.uncertainty.f298}, g = ${rx.uncertainty.g} K`}</Row>
        ) : null}
        <Row label="source">
          <bdi>{rx.source ?? "not given"}</bdi>
        </Row>
      </dl>
      {rx.rate.law === "photolysis" ? <PhotolysisDetails channel={rx.rate.channel} result={result} /> : null}
      {rx.note ? (
        <p className="mt-1 text-stone-600">
          <bdi>{rx.note}</bdi>
        </p>
      ) : null}
      <h3 className="mt-2 text-[11px] font-semibold uppercase tracking-wider text-stone-500">Species</h3>
      <p className="flex flex-wrap gap-1">
        {[...eq.reactants, ...eq.products]
          .map((t) => t.species)
          .filter((s, i, a) => a.indexOf(s) === i)
          .map((s) => (
            <button
              key={s}
              type="button"
              onClick={() => onSelect(`s:${s}`)}
              className="rounded border border-stone-300 px-1.5 hover:bg-stone-100 focus:outline-2 focus:outline-stone-800"
            >
              {s}
            </button>
          ))}
      </p>
      {inCycles.length ? (
        <>
          <h3 className="mt-2 text-[11px] font-semibold uppercase tracking-wider text-stone-500">In cycles</h3>
          <ul>
            {inCycles.map((c) => (
              <li key={c.id}>
                {c.netEquation} <span className="text-stone-500">({formatPercent(c.share)})</span>
              </li>
            ))}
          </ul>
        </>
      ) : null}
    </>
  );
}

/** J of a photolysis channel at the analysis's conditions, and where its light and data come from. */
function PhotolysisDetails({ channel, result }: { channel: string; result: AnalysisResult | null }) {
  const data = PHOTOLYSIS_CHANNELS.find((c) => c.id === channel)?.data;
  const J = result?.condition.J_s[channel];
  const light = result?.condition.sources?.J;
  return (
    <>
      <h3 className="mt-2 text-[11px] font-semibold uppercase tracking-wider text-stone-500">Photolysis</h3>
      <dl>
        <Row label="J here">{J !== undefined ? `${formatNumber(J)} s⁻¹` : "—"}</Row>
      </dl>
      {light ? <p className="text-stone-600">Light: {light}</p> : null}
      {data ? <p className="mt-1 text-stone-600">Data: {data}</p> : null}
    </>
  );
}
