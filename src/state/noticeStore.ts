import { createStore } from "zustand/vanilla";
import { useStore } from "zustand";

export interface Notice {
  id: number;
  tone: "info" | "warning" | "error";
  text: string;
}

/** Messages for the designer that are not tied to one field: a bad link, storage trouble, a failed import. */
export const noticeStore = createStore<{ notices: Notice[] }>(() => ({ notices: [] }));

let nextId = 1;

export function notify(tone: Notice["tone"], text: string): number {
  const id = nextId++;
  noticeStore.setState((s) => ({ notices: [...s.notices.filter((n) => n.text !== text), { id, tone, text }] }));
  return id;
}

export function dismissNotice(id: number): void {
  noticeStore.setState((s) => ({ notices: s.notices.filter((n) => n.id !== id) }));
}

export function useNotices(): Notice[] {
  return useStore(noticeStore, (s) => s.notices);
}
