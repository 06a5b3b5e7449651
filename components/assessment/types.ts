/** Plain props the assessment pages hand to the client components. */
import type { QuestionKind, Tolerance } from "@/lib/assessment/types";

export interface TemplateOption {
  kind: QuestionKind;
  title: string;
  summary: string;
  unit: string;
  defaultTolerance: Tolerance;
  needs: { cycle?: boolean; species?: boolean; pool?: string };
}

export interface MechanismOption {
  id: string;
  title: string;
  description?: string;
}

/** What POST /api/assessments/preview answers. */
export interface Preview {
  mechanism: { id: string; title: string };
  status: string;
  message: string;
  conditions: { label: string; value: string }[];
  families: string[];
  cycles: {
    id: string;
    family: string;
    netEquation: string;
    steps: string[];
    share: number;
    hasChainLength: boolean;
    stepCount: number;
  }[];
  solvedSpecies: string[];
  pools: string[];
}
