import type { VerdictWord } from "../verdict-word";

/** One car on the public paddock board: number, class and where it stands. No personal details. */
export type BoardCar = {
  carNumber: number;
  declaredClass: string;
  finalClass: string | null;
  status: VerdictWord;
};

export type Board = { eventName: string; updatedAt: string; cars: BoardCar[] };
