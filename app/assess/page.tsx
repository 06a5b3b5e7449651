import type { Metadata } from "next";
import { cookies } from "next/headers";
import { AssessmentBuilder, type MechanismOption, type TemplateOption } from "@/components/assessment";
import { QUESTION_TEMPLATES, SPEC_LIMITS } from "@/lib/assessment";
import { CONDITION_DEFAULTS } from "@/lib/atmosphere/condition";
import { listMechanisms } from "@/lib/service/mechanisms";
import { ownerFromCookies } from "@/lib/service/owner";

export const dynamic = "force-dynamic";
export const metadata: Metadata = { title: "Build an assessment · Ozone Loss Cycles" };

export default async function BuildAssessmentPage() {
  let mechanisms: MechanismOption[] = [];
  try {
    mechanisms = (await listMechanisms(ownerFromCookies(await cookies()))).mechanisms.map((m) => ({
      id: m.id,
      title: m.title,
      description: m.description,
    }));
  } catch {
    mechanisms = [];
  }
  const templates: TemplateOption[] = QUESTION_TEMPLATES.map((t) => ({
    kind: t.kind,
    title: t.title,
    summary: t.summary,
    unit: t.unit,
    defaultTolerance: t.defaultTolerance,
    needs: t.needs,
  }));
  return (
    <div className="mx-auto max-w-5xl px-4 py-8">
      <AssessmentBuilder
        mechanisms={mechanisms}
        templates={templates}
        maxVariants={SPEC_LIMITS.maxVariants}
        maxQuestions={SPEC_LIMITS.maxQuestions}
        defaults={{
          latitude_deg: CONDITION_DEFAULTS.latitude_deg,
          date: CONDITION_DEFAULTS.date,
          localSolarTime_h: CONDITION_DEFAULTS.localSolarTime_h,
        }}
      />
    </div>
  );
}
