// Enclosed-space entry: the precautions the brief lists and the caution that
// Tankwright shows wherever entry is recorded. The product records; it never
// decides that a space is safe to enter.

export const ENTRY_CAUTION =
  "A ballast tank is an enclosed space. Follow the ship's enclosed-space entry procedure, the company's safety management system, the flag state's rules and the class rules. Tankwright records the permit and the readings; it never replaces them, and no one enters because this product shows a reading.";

/** Precautions before entry (after IMO Res. A.1050(27) §6.3, in our own words). */
export const ENTRY_PRECAUTIONS = [
  "Entry permit issued and signed by the responsible officer; its reference noted.",
  "Hazards identified and isolated: ballast pumps and valves locked out, tank vents clear.",
  "Tank ventilated, and kept ventilated throughout the entry.",
  "Atmosphere tested with calibrated instruments at several levels before entry and at intervals: oxygen, flammable gas, hydrogen sulphide (H2S) and carbon monoxide (CO).",
  "Space secured and lit; access ladders and manholes checked.",
  "Communications agreed and tested between the team inside and the attendant.",
  "Attendant stationed at the entrance throughout, with no other duty.",
  "Rescue and resuscitation equipment ready at the entrance; the rescue plan known.",
  "Proper clothing and equipment: helmet, torch, personal gas detector, escape set where required.",
  "No single-person entry.",
] as const;
