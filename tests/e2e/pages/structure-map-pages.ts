import type { Page } from "playwright-core";

export class NewTankPage {
  constructor(private readonly page: Page) {}

  async fill(t: { code: string; name: string; side: string; kind: string; frameFrom: string; frameTo: string; bottomAreaM2?: string; atWaterline?: boolean }) {
    const p = this.page;
    await p.getByLabel("Code", { exact: true }).fill(t.code);
    await p.getByLabel("Name", { exact: true }).fill(t.name);
    await p.getByLabel("Side", { exact: true }).selectOption(t.side);
    await p.getByLabel("Kind", { exact: true }).selectOption(t.kind);
    await p.getByLabel("Aft frame").fill(t.frameFrom);
    await p.getByLabel("Forward frame").fill(t.frameTo);
    if (t.bottomAreaM2) await p.getByLabel("Bottom area (m²)").fill(t.bottomAreaM2);
    if (t.atWaterline) await p.getByLabel("At the waterline").check();
  }

  async submit() {
    await this.page.getByRole("button", { name: "Create tank" }).click();
  }
}

export class TankPage {
  constructor(private readonly page: Page) {}

  /** Adds a longitudinal set and waits until the catalogue lists `entry`. */
  async addLongitudinals(region: string, from: string, to: string, entry: string) {
    const form = this.page.getByRole("form", { name: "Add to the member catalogue" });
    await form.getByLabel("Member").selectOption("longitudinal");
    await form.getByLabel("Plating region").selectOption(region);
    await form.getByLabel("First number").fill(from);
    await form.getByLabel("Last number").fill(to);
    await form.getByRole("button", { name: "Add to catalogue" }).click();
    await this.page.getByRole("listitem").filter({ hasText: entry }).waitFor();
  }

  async addWebFrames(frames: string, entry: string) {
    const form = this.page.getByRole("form", { name: "Add to the member catalogue" });
    await form.getByLabel("Member").selectOption("web_frame");
    await form.getByLabel("At frames").fill(frames);
    await form.getByRole("button", { name: "Add to catalogue" }).click();
    await this.page.getByRole("listitem").filter({ hasText: entry }).waitFor();
  }

  catalogue() {
    return this.page.getByRole("heading", { name: "Member catalogue" }).locator("..");
  }
}
