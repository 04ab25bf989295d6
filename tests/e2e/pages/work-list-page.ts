import type { Locator, Page } from "playwright-core";

/** The docking pages: the new-docking form and the work list. */
export class WorkListPage {
  constructor(private readonly page: Page, private readonly baseUrl: string) {}

  async planDocking(vesselId: string, fields: Record<string, string>) {
    await this.page.goto(`${this.baseUrl}/vessels/${vesselId}/dockings`);
    await this.page.getByRole("link", { name: "Plan a docking" }).click();
    for (const [label, value] of Object.entries(fields)) await this.page.getByLabel(label, { exact: true }).fill(value);
    await this.page.getByRole("button", { name: "Create docking and gather the work list" }).click();
    await this.page.waitForURL(/\/dockings\/[0-9a-f-]{36}$/);
    await this.grandTotal().waitFor();
  }

  grandTotal() {
    return this.page.getByTestId("grand-total");
  }

  total(kind: string) {
    return this.page.getByTestId(`total-${kind}`);
  }

  /** The cells of each row (kind totals, grand total, work items) as the reader sees them. */
  async totalCells(kind: string) {
    return this.cellTexts(this.total(kind));
  }

  async grandTotalCells() {
    return this.cellTexts(this.grandTotal());
  }

  /** Each work item's cells: tank, work, quantity, unit rate, cost, actions. */
  async itemRows() {
    const rows = this.page.getByTestId("work-item");
    const out: string[][] = [];
    for (let n = 0; n < (await rows.count()); n += 1) out.push(await this.cellTexts(rows.nth(n)));
    return out;
  }

  /** The line that says which countersigned reports the list was gathered from, and the rates. */
  sources() {
    return this.page.getByText(/^Gathered from /);
  }

  private async cellTexts(row: Locator) {
    return (await row.locator("td").allInnerTexts()).map((t) => t.replace(/\s+/g, " ").trim());
  }

  async adjust(description: RegExp, quantity: string, reason: string) {
    const row = this.page.getByTestId("work-item").filter({ hasText: description });
    await row.getByRole("button", { name: /^Change/ }).click();
    await row.getByLabel(/Adjusted quantity/).fill(quantity);
    await row.getByLabel("Reason").fill(reason);
    await row.getByRole("button", { name: "Save" }).click();
    await this.page.getByText("Saved; the totals are priced again.").waitFor();
  }

  /** The "Add an item" form: work no finding asks for, at its own rate. */
  addItemForm() {
    return this.page.getByRole("form", { name: "Add an item" });
  }

  /** Fills the form (field label → value; "Tank" by its code) and sends it; waits for the answer, added or refused. */
  async fillItem(fields: Record<string, string>) {
    const form = this.addItemForm();
    for (const [label, value] of Object.entries(fields)) {
      if (label === "Tank") await form.getByLabel("Tank", { exact: true }).selectOption({ label: value });
      else await form.getByLabel(label, { exact: true }).fill(value);
    }
  }

  async addItem(fields: Record<string, string>) {
    await this.fillItem(fields);
    await this.addItemForm().getByRole("button", { name: "Add the item" }).click();
    await this.page.getByText("Added; the totals are priced again.").waitFor();
  }

  async removeItem(description: RegExp) {
    const row = this.page.getByTestId("work-item").filter({ hasText: description });
    await row.getByRole("button", { name: /^Remove / }).click();
    await row.getByRole("button", { name: /^Yes, remove / }).click();
    await this.page.getByText("Removed; the totals are priced again.").waitFor();
  }

  /** The "Edit the docking's details" disclosure, opened. */
  async openDetails() {
    const details = this.page.getByTestId("edit-docking");
    if ((await details.getAttribute("open")) === null) await details.locator("summary").click();
    return details.getByRole("form", { name: "The docking's details" });
  }

  /** Changes the docking's details (field label → value) and waits until the page shows the list priced again. */
  async editDetails(fields: Record<string, string>) {
    const form = await this.openDetails();
    for (const [label, value] of Object.entries(fields)) await form.getByLabel(label, { exact: true }).fill(value);
    await form.getByRole("button", { name: "Save the docking's details" }).click();
    await this.page.getByText("Saved; the work list is priced at these rates.").waitFor();
  }

  /** The vessel's dockings: each row's cells (planned, yard, place, status, items, grand total). */
  async dockingRows(vesselId: string) {
    await this.page.goto(`${this.baseUrl}/vessels/${vesselId}/dockings`);
    const rows = this.page.getByTestId("docking-row");
    await rows.first().waitFor();
    const out: string[][] = [];
    for (let n = 0; n < (await rows.count()); n += 1) out.push(await this.cellTexts(rows.nth(n)));
    return out;
  }

  async startDocking() {
    await this.page.getByRole("button", { name: "Start the docking" }).click();
    await this.page.getByRole("button", { name: "Complete the docking" }).waitFor();
  }

  async markDone(description: RegExp) {
    const row = this.page.getByTestId("work-item").filter({ hasText: description });
    await row.getByRole("button", { name: /^Mark done/ }).click();
    await this.page.getByText("Marked done; a finding closes when all its items are done.").waitFor();
  }

  /** Clicks "Export CSV" and returns the downloaded file's name and text. */
  async exportCsv() {
    const [download] = await Promise.all([this.page.waitForEvent("download"), this.page.getByRole("link", { name: "Export CSV" }).click()]);
    const stream = await download.createReadStream();
    const chunks: Buffer[] = [];
    for await (const chunk of stream) chunks.push(chunk as Buffer);
    return { fileName: download.suggestedFilename(), text: Buffer.concat(chunks).toString("utf8") };
  }
}
