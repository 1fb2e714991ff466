"use client";
import { useEffect, useId, useRef, useState } from "react";

type Scanner = { stop: () => Promise<void>; clear: () => void; isScanning: boolean };

/**
 * The phone camera reading a pass QR, with html5-qrcode loaded only when the camera opens.
 * Calls `onText` once with what the code says; the caller verifies it.
 */
export function PassScanner({
  onText,
  onClose,
}: {
  onText: (text: string) => void;
  onClose: () => void;
}) {
  const elementId = `scanner-${useId().replace(/:/g, "")}`;
  const [problem, setProblem] = useState<string | null>(null);
  const done = useRef(false);
  // The latest callback, so a parent re-render never restarts the camera mid-scan.
  const onTextRef = useRef(onText);
  onTextRef.current = onText;

  useEffect(() => {
    let scanner: Scanner | null = null;
    let cancelled = false;
    const starting = (async () => {
      const { Html5Qrcode, Html5QrcodeSupportedFormats } = await import("html5-qrcode");
      if (cancelled) return;
      const instance = new Html5Qrcode(elementId, {
        verbose: false,
        formatsToSupport: [Html5QrcodeSupportedFormats.QR_CODE],
        // The browser's own barcode detector where it has one (Chrome on Android): faster and
        // surer on a dense pass than the bundled ZXing, which every other browser uses.
        useBarCodeDetectorIfSupported: true,
      });
      scanner = instance;
      try {
        await instance.start(
          { facingMode: "environment" },
          // Decode the whole frame at the camera's resolution: a pass QR is dense (about 113
          // modules), and a guide box would scale it down to the box's on-screen size first.
          { fps: 10 },
          (text) => {
            if (done.current) return;
            done.current = true;
            onTextRef.current(text);
          },
          () => {},
        );
      } catch (error) {
        setProblem(
          error instanceof Error && /permission|notallowed/i.test(error.message)
            ? "The camera is blocked. Allow it in the browser, or type the car number below."
            : "No camera could be opened. Type the car number or pass code below.",
        );
      }
    })();
    return () => {
      cancelled = true;
      // Stop once the camera has started (or failed to), never while it is still opening.
      void starting.then(() => {
        const s = scanner;
        if (s?.isScanning)
          void s
            .stop()
            .then(() => s.clear())
            .catch(() => {});
      });
    };
  }, [elementId]);

  return (
    <div className="card space-y-3" data-testid="pass-scanner">
      <p className="text-lg font-semibold">Point the camera at the pass</p>
      {/* html5-qrcode decodes from a canvas the size of its element on screen. A pass QR is dense,
          so the element is laid out at twice the width and shown at half scale: the camera image
          is decoded at twice the resolution it is displayed at. */}
      <div className="mx-auto aspect-[4/3] w-full max-w-sm overflow-hidden rounded-lg bg-asphalt-900">
        <div id={elementId} className="w-[200%] origin-top-left scale-50" />
      </div>
      {problem ? (
        <p className="field-error" role="alert">
          {problem}
        </p>
      ) : null}
      <button type="button" className="btn-secondary w-full" onClick={onClose}>
        Close the camera
      </button>
    </div>
  );
}
