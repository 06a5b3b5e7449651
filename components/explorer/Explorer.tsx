"use client";
/**
 * The explorer: conditions on the left, the network in the middle, cycles and
 * the odd-oxygen budget on the right, an inspector over the network. Holds
 * the state, keeps it in the URL, and recomputes through the analysis route.
 */
import { useCallback, useEffect, useMemo, useRef, useState } from "react";
import type { AnalysisRequest, AnalysisResult, ConditionInput } from "@/lib/engine/types";
import { altitudeNeighbours } from "@/lib/viz/altitudeNeighbours";
import { cycleHighlight } from "@/lib/viz/cycleHighlight";
import { type ExplorerView, explorerQueryString } from "@/lib/viz/explorerQuery";
import { formatNumber } from "@/lib/viz/formatNumber";
import { graphSvg } from "@/lib/viz/graphSvg";
import { isolateText } from "@/lib/viz/isolateText";
import { LARGE_MECHANISM_SPECIES, networkElements, reactionNodeId, speciesNodeId } from "@/lib/viz/networkElements";
import { networkLegend } from "@/lib/viz/networkLegend";
import { networkStyle } from "@/lib/viz/networkStyle";
import { LARGE_MECHANISM_CAP, reactionDetail } from "@/lib/viz/reactionDetail";
import type { MechanismSummary, MechanismView } from "@/lib/viz/types";
import { DeletionTokenNote } from "../DeletionTokenNote";
import type { ApiError, Problem } from "../ui/apiClient";
import { fetchMechanism, fetchMechanisms } from "./api";
import { BudgetPanel } from "./BudgetPanel";
import { ConditionsPanel } from "./ConditionsPanel";
import { CycleMapCard } from "./CycleMapCard";
import { CyclesPanel } from "./CyclesPanel";
import { download } from "./download";
import { ExportBar } from "./ExportBar";
import { Inspector } from "./Inspector";
import { LargeMechanismNotice } from "./LargeMechanismNotice";
import { LegendCard } from "./LegendCard";
import { type NetworkHandle, NetworkView, preloadNetworkView } from "./NetworkView";
import { Toolbar } from "./Toolbar";
import { UncertaintyCard } from "./UncertaintyCard";
import { useAnalysis } from "./useAnalysis";
import { useNetworkLayout } from "./useNetworkLayout";

export interface StoredAnalysis {
  id: string;
  createdAt: string;
  engineVersion: string;
  currentEngineVersion: string;
  request: AnalysisRequest;
  result: AnalysisResult;
}

interface Props {
  mechanisms: MechanismSummary[];
  initialMechanism: MechanismView | null;
  mechanismId: string;
  condition: ConditionInput;
  view: ExplorerView;
  /** the stored analysis a permalink opens */
  stored?: StoredAnalysis;
  /** notes about URL parameters that were ignored */
  queryWarnings?: string[];
}

const STYLE = networkStyle();

/** Pause after the last change before the address is rewritten, ms. */
const URL_SETTLE_MS = 300;

export function Explorer(props: Props) {
  const [mechanisms, setMechanisms] = useState(props.mechanisms);
  const [mechanismId, setMechanismId] = useState(props.mechanismId);
  const [condition, setCondition] = useState(props.condition);
  const [view, setView] = useState(props.view);
  const [cache, setCache] = useState<Record<string, MechanismView>>(
    props.initialMechanism ? { [props.initialMechanism.id]: props.initialMechanism } : {},
  );
  const [mechError, setMechError] = useState<ApiError | null>(null);
  const [uploadToken, setUploadToken] = useState<{ id: string; token: string } | null>(null);
  const [notice, setNotice] = useState<string | null>(
    props.queryWarnings?.length ? props.queryWarnings.join("; ") : null,
  );
  // the live explorer writes its canonical address at once; a permalink keeps /a/<id> until something changes
  const touched = useRef(!props.stored);
  const net = useRef<NetworkHandle>(null);
  const mechanism = cache[mechanismId] ?? null;

  useEffect(preloadNetworkView, []);

  useEffect(() => {
    if (mechanisms.length === 0)
      fetchMechanisms().then(
        (r) => setMechanisms(r.mechanisms),
        () => undefined,
      );
  }, [mechanisms.length]);

  useEffect(() => {
    if (cache[mechanismId]) return;
    const ctrl = new AbortController();
    setMechError(null);
    fetchMechanism(mechanismId, ctrl.signal).then(
      (m) => setCache((c) => ({ ...c, [m.id]: m })),
      (e: ApiError) => {
        if (e.name !== "AbortError") setMechError(e);
      },
    );
    return () => ctrl.abort();
  }, [mechanismId, cache]);

  const request = useMemo<AnalysisRequest>(() => {
    const r: AnalysisRequest = { mechanismId, condition };
    if (props.stored?.request.options) r.options = props.stored.request.options;
    return r;
  }, [mechanismId, condition, props.stored]);
  const neighbours = useMemo(() => altitudeNeighbours(request), [request]);
  const analysis = useAnalysis(
    request,
    props.stored ? { id: props.stored.id, result: props.stored.result, request: props.stored.request } : undefined,
    neighbours,
  );
  const result = analysis.result && analysis.result.mechanism.id === mechanismId ? analysis.result : null;
  const showingStored = !!props.stored && analysis.id === props.stored.id;

  // the address reproduces what is on screen; it is written once the input settles, because each
  // replaceState costs Chromium a same-document navigation (and a fetch of the icon) on the slider's path
  useEffect(() => {
    if (!touched.current) return;
    const qs = explorerQueryString({ mechanismId, condition, view });
    const write = () => window.history.replaceState(window.history.state, "", `/explore?${qs}`);
    const timer = setTimeout(write, URL_SETTLE_MS);
    return () => clearTimeout(timer);
  }, [mechanismId, condition, view]);

  const touch = useCallback(<T,>(fn: (v: T) => void) => {
    return (v: T) => {
      touched.current = true;
      fn(v);
    };
  }, []);
  const setViewPart = (patch: Partial<ExplorerView>) => {
    touched.current = true;
    setView((v) => ({ ...v, ...patch }));
  };

  const layoutProgress = useNetworkLayout(mechanism);
  const layout = layoutProgress.layout;
  const large = !!mechanism && mechanism.species.length > LARGE_MECHANISM_SPECIES;
  const cycle = result?.cycles.cycles.find((c) => c.id === view.cycle) ?? null;
  // the selected cycle and the inspected reaction stay drawn whatever the detail
  const keepKey = [
    ...(cycle?.steps.map((s) => s.reactionId) ?? []),
    ...(view.select?.startsWith("r:") ? [view.select.slice(2)] : []),
  ].join(" ");
  const detail = useMemo(
    () =>
      mechanism
        ? reactionDetail(mechanism, result, {
            limit: view.detail,
            colorMode: view.colorMode,
            keep: keepKey ? keepKey.split(" ") : [],
            cap: large ? LARGE_MECHANISM_CAP : undefined,
          })
        : null,
    [mechanism, result, view.detail, view.colorMode, keepKey, large],
  );
  const elements = useMemo(
    () =>
      mechanism && layout && detail
        ? networkElements(mechanism, layout, result, {
            colorMode: view.colorMode,
            showHeld: view.showHeld,
            visible: new Set(detail.shown),
            onlyTouched: large,
          })
        : [],
    [mechanism, layout, result, detail, view.colorMode, view.showHeld, large],
  );
  // a very large mechanism offers only what is drawn for inspection: ten thousand options cost a long render
  const inspectable = useMemo(() => {
    if (!mechanism || !large) return mechanism;
    const drawn = new Set(elements.map((e) => e.data.id));
    return {
      ...mechanism,
      species: mechanism.species.filter((s) => drawn.has(speciesNodeId(s.id))),
      reactions: mechanism.reactions.filter((r) => drawn.has(reactionNodeId(r.id))),
    };
  }, [mechanism, large, elements]);
  const highlight = useMemo(() => cycleHighlight(elements, cycle), [elements, cycle]);
  const legend = useMemo(() => networkLegend(result, view.colorMode), [result, view.colorMode]);
  const selected = view.select && elements.some((e) => e.data.id === view.select) ? view.select : null;

  const err = analysis.error;
  const fieldErrors: Record<string, string> = {};
  if (err?.path?.startsWith("condition.")) {
    const field = err.path.slice("condition.".length);
    fieldErrors[field] = err.message.replace(`${err.path}: `, "");
  }
  const bannerError = err && !err.path?.startsWith("condition.") ? err : null;
  const ss = result?.steadyState;

  const fileStem = `ozone-${mechanismId}-${condition.altitude_km}km`;
  const onPng = async () => {
    const b = await net.current?.png();
    if (b) download(b, `${fileStem}.png`);
  };
  const onSvg = () => {
    const svg = graphSvg(elements, {
      positions: net.current?.positions(),
      dimmed: new Set(highlight.off),
      title: `${mechanism?.title ?? mechanismId} · ${condition.altitude_km} km · colour: ${view.colorMode === "flux" ? "reaction rate" : "odd oxygen"}`,
    });
    download(new Blob([svg], { type: "image/svg+xml" }), `${fileStem}.svg`);
  };

  const onUploaded = (m: { id: string; title: string; warnings: Problem[]; deletionToken?: string }) => {
    setUploadToken(m.deletionToken ? { id: m.id, token: m.deletionToken } : null);
    touched.current = true;
    fetchMechanisms().then(
      (r) => setMechanisms(r.mechanisms),
      () => undefined,
    );
    setMechanisms((list) =>
      list.some((x) => x.id === m.id)
        ? list
        : [
            ...list,
            { id: m.id, title: m.title, description: "uploaded", builtin: false, speciesCount: 0, reactionCount: 0 },
          ],
    );
    setMechanismId(m.id);
    setView((v) => ({ ...v, cycle: null, select: null }));
    setNotice(
      m.warnings?.length
        ? `Uploaded “${isolateText(m.title)}” with ${m.warnings.length} warning(s): ${m.warnings.map((w) => w.message).join("; ")}`
        : `Uploaded “${isolateText(m.title)}”.`,
    );
  };

  return (
    <>
      <div className="grid gap-2 p-2 md:grid-cols-[260px_minmax(0,1fr)] lg:h-[calc(100vh-38px)] lg:min-h-[700px] lg:grid-cols-[272px_minmax(0,1fr)_340px]">
        <h1 className="sr-only">Catalytic ozone-loss cycle explorer</h1>
        <ConditionsPanel
          mechanisms={mechanisms}
          mechanismId={mechanismId}
          mechanism={mechanism}
          onMechanism={touch((id: string) => {
            setMechanismId(id);
            setView((v) => ({ ...v, cycle: null, select: null }));
          })}
          onUploaded={onUploaded}
          condition={condition}
          onCondition={touch(setCondition)}
          resolved={result?.condition ?? null}
          fieldErrors={fieldErrors}
        />

        <div className="flex min-h-0 min-w-0 flex-col gap-2">
          <Toolbar
            colorMode={view.colorMode}
            onColorMode={(colorMode) => setViewPart({ colorMode })}
            showHeld={view.showHeld}
            onShowHeld={(showHeld) => setViewPart({ showHeld })}
            detailLimit={view.detail}
            onDetailLimit={(detail) => setViewPart({ detail })}
            detail={detail}
            onFit={() => net.current?.fit()}
            onZoom={(f) => net.current?.zoomBy(f)}
            loading={analysis.loading}
            mechanism={inspectable}
            selected={selected}
            onInspect={(id) => setViewPart({ select: id })}
            status={
              ss
                ? `${err ? "Showing the last analysis that succeeded: " : ""}${result?.condition.altitude_km} km · T ${formatNumber(result?.condition.T_K, 4)} K · p ${formatNumber(result?.condition.p_hPa, 3)} hPa · ${ss.status === "converged" ? `converged in ${ss.iterations} iterations` : ss.status}`
                : null
            }
          />
          {showingStored ? (
            <div
              data-testid="stored-banner"
              className="rounded border border-sky-300 bg-sky-50 px-3 py-1 text-[12px] text-sky-900"
            >
              Stored analysis of {new Date(props.stored!.createdAt).toUTCString()}: these are the stored numbers. Change
              any condition to recompute.{" "}
              <span data-testid="permanent-link">This link is permanent: the analysis is kept for good.</span>
              {props.stored!.engineVersion !== props.stored!.currentEngineVersion ? (
                <strong data-testid="engine-version-warning" className="ml-1 font-semibold text-amber-900">
                  Computed with engine {props.stored!.engineVersion}; the current engine is{" "}
                  {props.stored!.currentEngineVersion}, whose numbers may differ.
                </strong>
              ) : null}
            </div>
          ) : null}
          {uploadToken ? (
            <DeletionTokenNote
              token={uploadToken.token}
              what="the uploaded mechanism (its analyses then answer “gone” too)"
              deleteUrl={`/api/mechanisms/${uploadToken.id}`}
            />
          ) : null}
          {large && mechanism && detail ? (
            <LargeMechanismNotice mechanism={mechanism} detail={detail} analysed={!!result} layout={layoutProgress} />
          ) : null}
          {notice ? (
            <div className="flex items-start justify-between gap-2 rounded border border-stone-300 bg-stone-50 px-3 py-1 text-[12px] text-stone-700">
              <span>{notice}</span>
              <button
                type="button"
                className="text-stone-500 hover:text-stone-900"
                onClick={() => setNotice(null)}
                aria-label="Dismiss"
              >
                ✕
              </button>
            </div>
          ) : null}
          <div className="relative min-h-[420px] flex-1 overflow-hidden rounded-md border border-stone-300 bg-white md:min-h-[560px] lg:min-h-[360px]">
            {mechanism && layout ? (
              <NetworkView
                ref={net}
                layoutKey={mechanism.id}
                elements={elements}
                stylesheet={STYLE}
                highlight={highlight}
                selected={selected}
                onSelect={(id) => setViewPart({ select: id })}
              />
            ) : (
              <div className="absolute inset-0 grid place-items-center text-sm text-stone-500">
                {mechError
                  ? ""
                  : mechanism
                    ? `Laying out the network… ${layoutProgress.placed} of ${layoutProgress.total} reactions placed`
                    : "Loading the mechanism…"}
              </div>
            )}
            <div className="pointer-events-none absolute inset-x-2 top-2 flex flex-col items-start gap-2">
              {bannerError || mechError ? (
                <div
                  role="alert"
                  data-testid="server-error"
                  className="pointer-events-auto max-w-[560px] rounded border border-red-300 bg-red-50 px-3 py-1.5 text-[12px] text-red-900 shadow-sm"
                >
                  <b className="font-semibold">
                    {mechError ? "The mechanism could not be loaded" : "The analysis failed"}:
                  </b>{" "}
                  {(mechError ?? bannerError)!.message}
                </div>
              ) : null}
              {ss && ss.status === "instant" ? (
                <div
                  data-testid="instant-notice"
                  className="pointer-events-auto max-w-[560px] rounded border border-sky-300 bg-sky-50 px-3 py-1.5 text-[12px] text-sky-950 shadow-sm"
                >
                  <b className="font-semibold">An instant of a run, not a steady state.</b> {ss.message}
                </div>
              ) : null}
              {ss && ss.status !== "converged" && ss.status !== "instant" ? (
                <div
                  role="alert"
                  data-testid="steady-state-warning"
                  className="pointer-events-auto max-w-[560px] rounded border border-amber-300 bg-amber-50 px-3 py-1.5 text-[12px] text-amber-950 shadow-sm"
                >
                  <b className="font-semibold">No steady state ({ss.status}).</b> {ss.message} The numbers shown are
                  those of the last iterate and should not be trusted.
                </div>
              ) : null}
              {cycle ? (
                <div className="pointer-events-auto rounded border border-stone-800 bg-white/95 px-2 py-1 text-[12px] shadow-sm">
                  Showing cycle <b>{cycle.netEquation}</b> ({cycle.family}).{" "}
                  <button type="button" className="underline" onClick={() => setViewPart({ cycle: null })}>
                    Show all
                  </button>
                </div>
              ) : null}
            </div>
            {selected && mechanism ? (
              <div className="pointer-events-none absolute bottom-2 right-2 top-14 flex items-start">
                <Inspector
                  selected={selected}
                  mechanism={mechanism}
                  result={result}
                  onSelect={(id) => setViewPart({ select: id })}
                />
              </div>
            ) : null}
            {analysis.loading ? (
              <div
                data-testid="computing"
                className="pointer-events-none absolute right-2 top-2 rounded bg-stone-800/85 px-2 py-0.5 text-[11px] text-white"
              >
                computing…
              </div>
            ) : null}
          </div>
          <LegendCard legend={legend} empty={!result} />
          <ExportBar
            analysisId={analysis.id}
            onStore={analysis.store}
            onPng={onPng}
            onSvg={onSvg}
            busy={analysis.loading}
          />
        </div>

        <div className="grid min-h-0 gap-2 md:col-span-2 md:grid-cols-2 md:items-start lg:col-span-1 lg:flex lg:flex-col lg:items-stretch">
          <CycleMapCard
            report={result?.cycles ?? null}
            mechanism={mechanism}
            selected={cycle?.id ?? null}
            onSelect={(id) => setViewPart({ cycle: id })}
            fileStem={fileStem}
            title={`${mechanism?.title ?? mechanismId} · ${condition.altitude_km} km · cycles by family`}
          />
          <CyclesPanel
            report={result?.cycles ?? null}
            selected={cycle?.id ?? null}
            onSelect={(id) => setViewPart({ cycle: id })}
            onInspectReaction={(id) => setViewPart({ select: `r:${id}` })}
          />
          <BudgetPanel budget={result?.cycles.budget ?? null} />
        </div>
      </div>
      {/* below the fold, full width: the ranges and sensitivity tables need the room */}
      <div className="px-2 pb-2">
        <UncertaintyCard request={request} result={result} />
      </div>
    </>
  );
}
