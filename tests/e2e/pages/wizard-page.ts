import type { Page } from "playwright-core";

/** The inspection wizard as a person uses it: steps, labelled fields, the save indicator. */
export class WizardPage {
  constructor(private readonly page: Page) {}

  async goTo(step: string) {
    await this.page.getByRole("navigation", { name: "Steps" }).getByRole("link", { name: new RegExp(step) }).click();
    await this.page.getByRole("heading", { level: 2, name: step }).waitFor();
  }

  async waitSaved() {
    await this.page.getByTestId("save-status").filter({ hasText: "All changes saved" }).waitFor({ timeout: 15_000 });
  }

  field(label: string | RegExp, scope?: string) {
    const root = scope ? this.page.getByRole("article", { name: scope }) : this.page;
    return root.getByLabel(label, { exact: typeof label === "string" });
  }
}
