import { expect, test } from "@playwright/test";

// Browser test of the assessment builder as an instructor would use it, against the started production server.
// Screenshots go to test-results/screenshots/ for a person to look at.

const SHOTS = "test-results/screenshots";

test("an instructor builds a ten-variant assessment, opens both links, prints the sheets and marks a class", async ({
  page,
  context,
}) => {
  test.setTimeout(180_000);
  await page.goto("/assess");
  await expect(page.getByRole("heading", { level: 1, name: "Build an assessment" })).toBeVisible();

  await page.getByLabel("Title", { exact: true }).fill("Week 6: catalytic ozone loss");
  await page.getByLabel("Mechanism", { exact: true }).selectOption("oxygen-chlorine");
  await page.getByRole("button", { name: "Find the cycles and species at these conditions" }).click();
  await expect(page.getByText(/\d+ cycles, \d+ solved species/)).toBeVisible({ timeout: 30_000 });

  await page.getByRole("checkbox", { name: "Vary total chlorine (Cly)" }).check();
  const add = async (kind: string) => {
    await page.getByLabel("Question kind", { exact: true }).selectOption({ label: kind });
    await page.getByRole("button", { name: "Add question" }).click();
  };
  // the builder starts with the dominant-family question
  await expect(page.getByRole("listitem", { name: "Question 1: Dominant odd-oxygen loss family" })).toBeVisible();
  await add("Rate-limiting step of a cycle");
  await add("Chain length of a cycle");
  await add("Steady-state ratio of two species");
  await add("Change in the ClOx share when chlorine doubles");
  const q4 = page.getByRole("listitem", { name: /Question 4/ });
  await q4.getByLabel("Numerator [A]", { exact: true }).selectOption("ClO");
  await q4.getByLabel("Denominator [B]", { exact: true }).selectOption("Cl");
  // the cycle questions start on the first cycle that fits; the chlorine cycle is what we want here
  for (const n of [2, 3]) {
    const cycle = page
      .getByRole("listitem", { name: new RegExp(`Question ${n}`) })
      .getByLabel("Cycle", { exact: true });
    const value = await cycle.locator("option", { hasText: "ClOx: Cl + O3" }).first().getAttribute("value");
    await cycle.selectOption(value as string);
  }
  await page.getByLabel("Number of variants", { exact: true }).fill("10");
  await page.getByLabel("Seed (optional)", { exact: true }).fill("2026");
  await page.screenshot({ path: `${SHOTS}/assess-builder.png`, fullPage: true });

  await page.getByRole("button", { name: "Build the assessment" }).click();
  await page.waitForURL(/\/assess\/i\/[A-Za-z0-9_-]{16}$/, { timeout: 120_000 });
  // the deletion token is shown once, with what it is for, and leaves the address (it came in the fragment)
  await expect(page.getByTestId("deletion-token")).toContainText(/Deletion token.*[A-Za-z0-9_-]{43}/);
  await expect(page.getByTestId("deletion-token")).toContainText("both links");
  expect(new URL(page.url()).hash).toBe("");
  await expect(page.getByText("Instructor copy — contains the answer key")).toBeVisible();
  const keyRows = page.getByRole("table", { name: "Answer key" }).locator("tbody tr");
  await expect(keyRows).toHaveCount(10);
  await page.screenshot({ path: `${SHOTS}/assess-instructor.png`, fullPage: true });

  // The key as a download.
  const [download] = await Promise.all([
    page.waitForEvent("download"),
    page.getByRole("link", { name: "Key (CSV)" }).click(),
  ]);
  expect(download.suggestedFilename()).toMatch(/-key\.csv$/);

  // The student link, written out on the page, opens the sheets without any key.
  const studentHref = await page.getByRole("link", { name: /\/assess\/s\// }).getAttribute("href");
  expect(studentHref).toMatch(/^\/assess\/s\/[A-Za-z0-9_-]{16}$/);
  const firstAnswer = (await keyRows.first().locator("td").nth(4).textContent())?.trim() as string;
  const student = await context.newPage();
  await student.goto(studentHref as string);
  await expect(student.getByRole("article")).toHaveCount(10);
  await expect(student.getByRole("article", { name: "Variant 1", exact: true })).toContainText("Altitude");
  expect(await student.content()).not.toContain(firstAnswer);
  await student.screenshot({ path: `${SHOTS}/assess-student.png`, fullPage: false });

  // Print view: no site chrome, one sheet per page.
  await student.emulateMedia({ media: "print" });
  await expect(student.locator("header.no-print").first()).toBeHidden();
  await expect(student.getByRole("button", { name: /Print/ })).toBeHidden();
  await student.goto(`${studentHref}?v=1`);
  await student.screenshot({ path: `${SHOTS}/assess-student-print.png`, fullPage: true });
  await student.goto(studentHref as string);
  // every printed sheet carries the research-and-teaching caution
  await expect(student.getByTestId("sheet-caution")).toHaveCount(10);
  await expect(student.getByTestId("sheet-caution").first()).toBeVisible();
  await expect(student.getByTestId("sheet-caution").first()).toContainText("not for regulatory reporting");
  const pdf = await student.pdf({ path: `${SHOTS}/assess-student.pdf`, format: "A4", printBackground: true });
  const pages = (pdf.toString("latin1").match(/\/Type\s*\/Page[^s]/g) ?? []).length;
  expect(pages).toBe(10);

  // Marking: a class of two from a CSV file.
  const csv = "student,variant,q1,q2,q3,q4,q5\nAda,1,b,b,1,1,1\nBen,2,,,,,\n";
  await page
    .getByLabel("Answer file", { exact: true })
    .setInputFiles({ name: "answers.csv", mimeType: "text/csv", buffer: Buffer.from(csv) });
  await page.getByRole("button", { name: "Mark", exact: true }).click();
  const marks = page.getByRole("table", { name: "Marks" });
  await expect(marks.locator("tbody tr")).toHaveCount(2);
  await expect(marks.locator("tbody tr").nth(1)).toContainText("0 / 5");
  await expect(page.getByRole("button", { name: "Download marks (CSV)" })).toBeVisible();
  await page.getByRole("table", { name: "Marks" }).scrollIntoViewIfNeeded();
  await page.screenshot({ path: `${SHOTS}/assess-marks.png`, fullPage: true });

  // The key prints without the links, the buttons and the marking panel.
  await page.emulateMedia({ media: "print" });
  await expect(page.getByRole("heading", { name: "Mark the class" })).toBeHidden();
  await expect(page.getByRole("table", { name: "Answer key" })).toBeVisible();
  await expect(page.getByTestId("key-caution")).toBeVisible();
  await expect(page.getByTestId("key-caution")).toContainText("not for regulatory reporting");
  await page.screenshot({ path: `${SHOTS}/assess-key-print.png`, fullPage: true });
});
