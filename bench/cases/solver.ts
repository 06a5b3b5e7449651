/**
 * Steady-state engine benchmarks on the reference mechanism: one cold-start
 * steady state, one warm start from the neighbouring level (1 km below), a
 * 51-level profile 10–60 km (each level warm-started from the one below, as a
 * profile sweep does), the same profile cold at every level, and one 24-hour
 * (diurnal) steady state. Conditions (U.S. Standard Atmosphere 1976, the
 * default climatology, photolysis from lib/photolysis) are prepared in setup
 * and not timed; the diurnal case looks its 96 samples up from a table, so it
 * times the solver alone (the engine also pays ~96 photolysis calls).
 */
import { climatologyAt, solarZenithAngle, standardAtmosphere } from "../../lib/atmosphere";
import { loadBuiltinMechanism } from "../../lib/mechanism";
import type { CompiledMechanism } from "../../lib/mechanism/types";
import { photolysisFrequencies } from "../../lib/photolysis";
import { solveDiurnal, solveSteadyState } from "../../lib/solver";
import type { SolveConditions } from "../../lib/solver/types";
import type { BenchCase } from "../types";

function conditionsAt(mech: CompiledMechanism, z_km: number, zenith_deg: number): SolveConditions {
  const std = standardAtmosphere(z_km);
  const M = std.M_cm3;
  const clim = climatologyAt(z_km) as Record<string, number>;
  const held_cm3: Record<string, number> = {};
  for (const s of mech.species) if (s.role === "held" && clim[s.id] !== undefined) held_cm3[s.id] = clim[s.id] * M;
  held_cm3.O3 = clim.O3 * M;
  const poolTotals_cm3: Record<string, number> = {};
  for (const p of mech.pools) if (clim[p.id] !== undefined) poolTotals_cm3[p.id] = clim[p.id] * M;
  return {
    T_K: std.T_K,
    M_cm3: M,
    J_s: photolysisFrequencies({ altitude_km: z_km, zenith_deg, T_K: std.T_K }),
    held_cm3,
    poolTotals_cm3,
  };
}

export async function setup(): Promise<BenchCase[]> {
  const mech = loadBuiltinMechanism("reference").mechanism;
  const at30 = conditionsAt(mech, 30, 30);
  const at29 = solveSteadyState(mech, conditionsAt(mech, 29, 30));
  const levels = Array.from({ length: 51 }, (_, i) => conditionsAt(mech, 10 + i, 30));
  const profile = (warm: boolean) => {
    let previous: number[] | undefined;
    let iterations = 0;
    let converged = 0;
    for (const c of levels) {
      const s = solveSteadyState(mech, c, warm && previous ? { initialState: previous } : {});
      previous = s.numberDensity_cm3;
      iterations += s.iterations;
      if (s.status === "converged") converged++;
    }
    return { iterations, converged };
  };
  const std30 = standardAtmosphere(30);
  const samples = Array.from({ length: 96 }, (_, i) =>
    photolysisFrequencies({
      altitude_km: 30,
      zenith_deg: solarZenithAngle({ latitude_deg: 45, dayOfYear: 80, localSolarTime_h: i / 4 }),
      T_K: std30.T_K,
    }),
  );
  const diurnalInput = {
    conditionsAt: (t_h: number) => ({ ...at30, J_s: samples[Math.round(t_h * 4) % 96] }),
    reportAt_h: 12,
  };

  // iteration counts for the notes (one untimed run each)
  const cold = solveSteadyState(mech, at30);
  const warm = solveSteadyState(mech, at30, { initialState: at29.numberDensity_cm3 });
  const pw = profile(true);
  const pc = profile(false);
  const d = solveDiurnal(mech, diurnalInput);

  return [
    {
      name: "solver: reference steady state, cold start (30 km, SZA 30°)",
      run: () => solveSteadyState(mech, at30),
      note: `${cold.status}, ${cold.iterations} iterations (${cold.coldStartSteps} pseudo-time); aim < 20 ms`,
    },
    {
      name: "solver: reference steady state, warm start from 29 km",
      run: () => solveSteadyState(mech, at30, { initialState: at29.numberDensity_cm3 }),
      note: `${warm.status}, ${warm.iterations} Newton iterations; aim < 5 ms`,
    },
    {
      name: "solver: 51-level profile 10–60 km, warm-started level to level",
      run: () => profile(true),
      iterations: 10,
      note: `${pw.converged}/51 converged, ${pw.iterations} iterations in all`,
    },
    {
      name: "solver: 51-level profile 10–60 km, cold start at every level",
      run: () => profile(false),
      iterations: 10,
      note: `${pc.converged}/51 converged, ${pc.iterations} iterations in all`,
    },
    {
      name: "solver: reference 24-hour steady state (30 km, 45° N, equinox)",
      run: () => solveDiurnal(mech, diurnalInput),
      iterations: 5,
      note: `${d.status}, ${d.daysIntegrated} days, ${d.integratorSteps} ROS3 steps, periodicity ${d.periodicityError.toExponential(1)}; aim < 2 s`,
    },
  ];
}
