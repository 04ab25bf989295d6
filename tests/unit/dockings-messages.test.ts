// A refused docking write names each field as the forms label it, with its own message.
import { describe, expect, it } from "vitest";
import { describeIssues, fieldLabel } from "@/lib/office/docking-messages";

describe("docking messages in words", () => {
  it("names a field by its label, one item's field without its number, another item's with it", () => {
    expect(fieldLabel("unitRate")).toBe("Unit rate");
    expect(fieldLabel("items.0.adjustedQuantity")).toBe("Adjusted quantity");
    expect(fieldLabel("items.2.adjustmentReason", true)).toBe("Item 3, reason");
  });

  it("gives each field its own message, a message that reads on after the name, an instruction after a colon", () => {
    expect(
      describeIssues([
        { path: "items.0.adjustedQuantity", message: "cannot be negative" },
        { path: "items.0.adjustmentReason", message: "is required: say why the quantity was changed" },
      ]),
    ).toBe("Adjusted quantity cannot be negative; Reason is required: say why the quantity was changed.");
    expect(describeIssues([{ path: "yard", message: "name the yard" }])).toBe("Yard: name the yard.");
  });

  it("says which item when the body decides on several", () => {
    expect(describeIssues([{ path: "items.1.adjustmentReason", message: "is required: say why the item is excluded" }], 2)).toBe("Item 2, reason is required: say why the item is excluded.");
  });
});
