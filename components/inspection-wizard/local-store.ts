"use client";

// What the officer typed, kept in the browser until the server has it: drafts
// per part of the inspection, and the outbox of requests still to send. Both
// survive a reload, a closed tab and a lost connection.

export type TOutboxEntry = {
  /** One entry per part: a newer edit of the same part replaces the older one. */
  part: string;
  url: string;
  method: "PUT" | "POST" | "DELETE";
  body: Record<string, unknown>;
  idempotencyKey: string;
  queuedAt: number;
};

export type TDraft = { value: unknown; dirty: boolean; payload: string | null };

const read = <T,>(key: string, fallback: T): T => {
  try {
    const raw = window.localStorage.getItem(key);
    return raw ? (JSON.parse(raw) as T) : fallback;
  } catch {
    return fallback;
  }
};
const write = (key: string, value: unknown) => {
  try {
    window.localStorage.setItem(key, JSON.stringify(value));
  } catch {
    // Storage full or blocked: the edit still lives in memory and in the outbox being sent.
  }
};

export function draftStore(inspectionId: string) {
  const key = `tankwright:draft:${inspectionId}`;
  return {
    all: () => read<Record<string, TDraft>>(key, {}),
    get: (part: string) => read<Record<string, TDraft>>(key, {})[part],
    set(part: string, draft: TDraft) {
      const all = read<Record<string, TDraft>>(key, {});
      all[part] = draft;
      write(key, all);
    },
    /** The server has this payload: the draft is clean unless it changed since. */
    markSaved(part: string, payload: string) {
      const all = read<Record<string, TDraft>>(key, {});
      if (all[part] && all[part]!.payload === payload) {
        all[part] = { ...all[part]!, dirty: false };
        write(key, all);
      }
    },
    drop(part: string) {
      const all = read<Record<string, TDraft>>(key, {});
      delete all[part];
      write(key, all);
    },
  };
}

export function outboxStore(inspectionId: string) {
  const key = `tankwright:outbox:${inspectionId}`;
  return {
    list: () => read<TOutboxEntry[]>(key, []),
    put(entry: TOutboxEntry) {
      const list = read<TOutboxEntry[]>(key, []).filter((e) => e.part !== entry.part);
      list.push(entry);
      write(key, list);
    },
    remove(part: string, idempotencyKey: string) {
      write(key, read<TOutboxEntry[]>(key, []).filter((e) => !(e.part === part && e.idempotencyKey === idempotencyKey)));
    },
    clearPart(part: string) {
      write(key, read<TOutboxEntry[]>(key, []).filter((e) => e.part !== part));
    },
  };
}
