"use client";

import { useEffect, useId, useRef, useState } from "react";
import type { IScannerControls } from "@zxing/browser";
import { Button } from "@/components/ui/button";
import { SERIAL_BARCODE_FORMATS, serialFromBarcode } from "@/lib/field/serial-barcode";

// Reads a serial number's barcode with the phone's camera, or from a photo
// of the label, in the browser; the barcode library is loaded only when asked.

async function makeReader() {
  const [{ BrowserMultiFormatReader }, { BarcodeFormat, DecodeHintType }] = await Promise.all([
    import("@zxing/browser"),
    import("@zxing/library"),
  ]);
  const hints = new Map<number, unknown>([
    [DecodeHintType.POSSIBLE_FORMATS, SERIAL_BARCODE_FORMATS.map((name) => BarcodeFormat[name])],
    [DecodeHintType.TRY_HARDER, true],
  ]);
  return new BrowserMultiFormatReader(hints as never);
}

/** "Scan barcode" (live camera) and "From a photo" for one serial field; `onSerial` gets the serial read. */
export function SerialScanner({ what, onSerial, testId }: { what: string; onSerial: (serial: string) => void; testId: string }) {
  const [scanning, setScanning] = useState(false);
  const [notice, setNotice] = useState<string | null>(null);
  const video = useRef<HTMLVideoElement>(null);
  const controls = useRef<IScannerControls | null>(null);
  const photoId = useId();

  const stop = () => {
    controls.current?.stop();
    controls.current = null;
    setScanning(false);
  };
  useEffect(() => () => controls.current?.stop(), []);

  function found(text: string) {
    const serial = serialFromBarcode(text);
    onSerial(serial);
    setNotice(`Read ${serial} from the barcode. Check it against the label.`);
  }

  async function scan() {
    setNotice(null);
    setScanning(true);
    try {
      const reader = await makeReader();
      controls.current = await reader.decodeFromConstraints(
        { video: { facingMode: "environment" } },
        video.current ?? undefined,
        (result, _error, c) => {
          if (!result) return;
          c.stop();
          controls.current = null;
          setScanning(false);
          found(result.getText());
        },
      );
    } catch {
      stop();
      setNotice("The camera could not be opened here. Type the serial, or take a photo of the barcode.");
    }
  }

  async function fromPhoto(file: File | undefined) {
    if (!file) return;
    setNotice("Reading the photo…");
    const url = URL.createObjectURL(file);
    try {
      found((await (await makeReader()).decodeFromImageUrl(url)).getText());
    } catch {
      setNotice("No barcode could be read in that photo. Hold the phone closer and level with the label, or type the serial.");
    } finally {
      URL.revokeObjectURL(url);
    }
  }

  return (
    <div className="space-y-2" data-testid={testId}>
      <div className="flex flex-wrap gap-2">
        {scanning ? (
          <Button type="button" variant="secondary" onClick={stop}>
            Stop the camera
          </Button>
        ) : (
          <Button type="button" variant="secondary" onClick={() => void scan()} aria-label={`Scan the barcode of ${what}`}>
            Scan barcode
          </Button>
        )}
        <label htmlFor={photoId} className="cursor-pointer rounded border border-paper-edge bg-white px-3 py-2 text-sm hover:bg-paper-deep">
          From a photo
          <input
            id={photoId}
            type="file"
            accept="image/*"
            capture="environment"
            className="sr-only"
            aria-label={`Photo of the barcode of ${what}`}
            onChange={(e) => void fromPhoto(e.target.files?.[0])}
          />
        </label>
      </div>
      <video
        ref={video}
        className={scanning ? "aspect-video w-full rounded border border-paper-edge bg-ink" : "hidden"}
        muted
        playsInline
      />
      {notice ? (
        <p className="text-xs text-ink-soft" role="status">
          {notice}
        </p>
      ) : null}
    </div>
  );
}
