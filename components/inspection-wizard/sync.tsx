"use client";

import { useQueryClient } from "@tanstack/react-query";
import { createContext, useCallback, useContext, useEffect, useMemo, useRef, useState, type ReactNode } from "react";
import type { TIssue } from "@/lib/errors";
import { draftStore, outboxStore, type TOutboxEntry } from "./local-store";

type TRefusal = { message: string; issues: TIssue[] };
export type TConflict = { entry: TOutboxEntry; message: string };
export type TSyncState = {
  pending: number;
  offline: boolean;
  signedOut: boolean;
  conflict: TConflict | null;
  refused: Record<string, TRefusal>;
  lastSavedAt: number | null;
};

type TSync = TSyncState & {
  enqueue: (e: Omit<TOutboxEntry, "idempotencyKey" | "queuedAt">) => void;
  resolveConflict: (choice: "mine" | "theirs") => Promise<void>;
  /** Bumped when a part must be reloaded from the server (after "take theirs"). */
  resets: Record<string, number>;
  drafts: ReturnType<typeof draftStore>;
  isQueued: (part: string) => boolean;
  /** A part with an edit waiting for the typing pause: counted as not yet saved. */
  setWaiting: (part: string, waiting: boolean) => void;
  waiting: number;
};

const SyncContext = createContext<TSync | null>(null);
export const useSync = () => {
  const s = useContext(SyncContext);
  if (!s) throw new Error("useSync outside SyncProvider");
  return s;
};

const RETRY_MS = [1000, 3000, 8000, 15000, 30000];

/**
 * Sends the outbox one request at a time, each with the version the browser
 * last saw: a success moves the version on, a refusal (400/422) is shown
 * beside its part, a conflict (409) pauses everything until the officer
 * chooses, and a lost connection retries with back-off. Nothing is dropped
 * until the server has it or the officer discards it.
 */
export function SyncProvider({ inspectionId, initialVersion, children }: { inspectionId: string; initialVersion: number; children: ReactNode }) {
  const queryClient = useQueryClient();
  const outbox = useMemo(() => outboxStore(inspectionId), [inspectionId]);
  const drafts = useMemo(() => draftStore(inspectionId), [inspectionId]);
  const version = useRef(initialVersion);
  const running = useRef(false);
  const attempt = useRef(0);
  const [state, setState] = useState<TSyncState>({ pending: 0, offline: false, signedOut: false, conflict: null, refused: {}, lastSavedAt: null });
  const [resets, setResets] = useState<Record<string, number>>({});
  const [tick, setTick] = useState(0);
  const conflictRef = useRef<TConflict | null>(null);

  const refresh = useCallback(() => queryClient.invalidateQueries({ queryKey: ["inspection", inspectionId] }), [queryClient, inspectionId]);

  const run = useCallback(async () => {
    if (running.current || conflictRef.current) return;
    running.current = true;
    try {
      for (;;) {
        const entry = outbox.list()[0];
        setState((s) => ({ ...s, pending: outbox.list().length }));
        if (!entry) break;
        let res: Response;
        try {
          res = await fetch(entry.url, {
            method: entry.method,
            headers: { "content-type": "application/json", "idempotency-key": entry.idempotencyKey },
            body: JSON.stringify({ ...entry.body, version: version.current }),
          });
        } catch {
          setState((s) => ({ ...s, offline: true }));
          const wait = RETRY_MS[Math.min(attempt.current++, RETRY_MS.length - 1)]!;
          window.setTimeout(() => setTick((t) => t + 1), wait);
          return;
        }
        attempt.current = 0;
        const body = (await res.json().catch(() => ({}))) as { version?: number; error?: { code: string; message: string; issues: TIssue[] } };
        if (res.ok) {
          if (body.version) version.current = body.version;
          outbox.remove(entry.part, entry.idempotencyKey);
          drafts.markSaved(entry.part, JSON.stringify(entry.body));
          setState((s) => {
            const refused = { ...s.refused };
            delete refused[entry.part];
            return { ...s, offline: false, refused, lastSavedAt: Date.now() };
          });
          continue;
        }
        if (res.status === 401) {
          setState((s) => ({ ...s, signedOut: true }));
          return;
        }
        if (res.status === 409 && body.error?.issues.some((i) => i.path === "version")) {
          const conflict = { entry, message: body.error.message };
          conflictRef.current = conflict;
          setState((s) => ({ ...s, conflict }));
          await refresh();
          return;
        }
        if (res.status >= 500) {
          const wait = RETRY_MS[Math.min(attempt.current++, RETRY_MS.length - 1)]!;
          window.setTimeout(() => setTick((t) => t + 1), wait);
          return;
        }
        // Refused (400, 404, 409 locked, 422): nothing changed on the server; keep the draft and say why.
        outbox.remove(entry.part, entry.idempotencyKey);
        setState((s) => ({ ...s, refused: { ...s.refused, [entry.part]: { message: body.error?.message ?? `Refused (${res.status}).`, issues: body.error?.issues ?? [] } } }));
      }
    } finally {
      running.current = false;
      setState((s) => ({ ...s, pending: outbox.list().length }));
      void refresh();
    }
  }, [outbox, drafts, refresh]);

  useEffect(() => {
    void run();
  }, [run, tick]);

  useEffect(() => {
    const online = () => setTick((t) => t + 1);
    window.addEventListener("online", online);
    return () => window.removeEventListener("online", online);
  }, []);

  const enqueue = useCallback<TSync["enqueue"]>(
    (e) => {
      outbox.put({ ...e, idempotencyKey: crypto.randomUUID(), queuedAt: Date.now() });
      setTick((t) => t + 1);
    },
    [outbox],
  );

  const resolveConflict = useCallback<TSync["resolveConflict"]>(
    async (choice) => {
      const conflict = conflictRef.current;
      if (!conflict) return;
      const res = await fetch(`/api/v1/inspections/${inspectionId}`);
      const view = (await res.json()) as { inspection?: { version: number } };
      if (view.inspection) version.current = view.inspection.version;
      if (choice === "theirs") {
        outbox.clearPart(conflict.entry.part);
        drafts.drop(conflict.entry.part);
        setResets((r) => ({ ...r, [conflict.entry.part]: (r[conflict.entry.part] ?? 0) + 1 }));
      } else {
        // Send mine again as a new request on top of their version.
        outbox.put({ ...conflict.entry, idempotencyKey: crypto.randomUUID() });
      }
      conflictRef.current = null;
      setState((s) => ({ ...s, conflict: null }));
      await refresh();
      setTick((t) => t + 1);
    },
    [inspectionId, outbox, drafts, refresh],
  );

  const isQueued = useCallback((part: string) => outbox.list().some((e) => e.part === part), [outbox]);
  const [waitingParts, setWaitingParts] = useState<ReadonlySet<string>>(new Set());
  const setWaiting = useCallback((part: string, waiting: boolean) => {
    setWaitingParts((prev) => {
      if (prev.has(part) === waiting) return prev;
      const next = new Set(prev);
      if (waiting) next.add(part);
      else next.delete(part);
      return next;
    });
  }, []);
  const value = useMemo<TSync>(
    () => ({ ...state, enqueue, resolveConflict, resets, drafts, isQueued, setWaiting, waiting: waitingParts.size }),
    [state, enqueue, resolveConflict, resets, drafts, isQueued, setWaiting, waitingParts],
  );
  return <SyncContext.Provider value={value}>{children}</SyncContext.Provider>;
}
