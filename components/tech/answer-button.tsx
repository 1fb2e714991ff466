import type { ReactNode } from "react";

const looks = {
  cleared: {
    idle: "border-cleared bg-cleared-soft text-cleared",
    pressed: "border-cleared bg-cleared text-white",
  },
  stopped: {
    idle: "border-stopped bg-stopped-soft text-stopped",
    pressed: "border-stopped bg-stopped text-white",
  },
  neutral: {
    idle: "border-asphalt-800 bg-white text-asphalt-950",
    pressed: "border-asphalt-900 bg-asphalt-800 text-white",
  },
} as const;

/**
 * A checklist answer button. The recorded answer shows pressed (aria-pressed, filled, ticked),
 * so the choice reads without relying on colour.
 */
export function AnswerButton({
  tone,
  pressed,
  onClick,
  disabled,
  children,
}: {
  tone: keyof typeof looks;
  pressed: boolean;
  onClick: () => void;
  disabled: boolean;
  children: ReactNode;
}) {
  return (
    <button
      type="button"
      className={`btn border-2 ${pressed ? looks[tone].pressed : looks[tone].idle}`}
      aria-pressed={pressed}
      onClick={onClick}
      disabled={disabled}
    >
      {pressed ? (
        <svg viewBox="0 0 24 24" className="size-5" aria-hidden="true">
          <path
            d="M5 12.5l4.5 4.5L19 7.5"
            fill="none"
            stroke="currentColor"
            strokeWidth="3"
            strokeLinecap="round"
            strokeLinejoin="round"
          />
        </svg>
      ) : null}
      {children}
    </button>
  );
}
