import { createStore, get, set, type UseStore } from "idb-keyval";
import type { BoardSnapshot } from "../board/board-schema";
import { IDB_STORE_NAMES } from "./idb-stores";

/** Bump when BoardSnapshot changes shape: an older copy is then ignored, never misread. */
const SNAPSHOT_FORMAT = 1;

type StoredBoard = { format: number; snapshot: BoardSnapshot };

let store: UseStore | undefined;
const boards = () => {
  store ??= createStore(IDB_STORE_NAMES.boards.database, IDB_STORE_NAMES.boards.store);
  return store;
};

/** Keep the board a screen last heard, so a reload with no signal still shows it. */
export async function saveBoardSnapshot(eventId: string, snapshot: BoardSnapshot): Promise<void> {
  await set(eventId, { format: SNAPSHOT_FORMAT, snapshot } satisfies StoredBoard, boards());
}

/** The board this screen last heard for an event, or undefined (none, another format, or no
 *  IndexedDB: a private window may refuse it, and the board then runs without a saved copy). */
export async function loadBoardSnapshot(eventId: string): Promise<BoardSnapshot | undefined> {
  try {
    const stored = await get<StoredBoard>(eventId, boards());
    return stored?.format === SNAPSHOT_FORMAT ? stored.snapshot : undefined;
  } catch {
    return undefined;
  }
}
