'use client';
// Reads an offcut label's QR code with the tablet's back camera (needs HTTPS or localhost).
import { useEffect, useRef, useState } from 'react';
import { Notice } from '@/components/ui/notice';

export function LabelScanner({ onTag }: { onTag: (tag: string) => void }) {
  const video = useRef<HTMLVideoElement>(null);
  const [problem, setProblem] = useState<string | null>(null);

  useEffect(() => {
    let stop: (() => void) | undefined;
    let cancelled = false;
    (async () => {
      if (!navigator.mediaDevices?.getUserMedia) {
        setProblem('This browser cannot use the camera here (it needs HTTPS). Type the tag instead.');
        return;
      }
      try {
        const { BrowserQRCodeReader } = await import('@zxing/browser');
        const controls = await new BrowserQRCodeReader().decodeFromConstraints(
          { video: { facingMode: 'environment' } },
          video.current ?? undefined,
          (result) => {
            if (result) onTag(result.getText().trim());
          },
        );
        if (cancelled) controls.stop();
        else stop = () => controls.stop();
      } catch {
        setProblem('The camera could not be opened. Allow camera access, or type the tag instead.');
      }
    })();
    return () => {
      cancelled = true;
      stop?.();
    };
  }, [onTag]);

  return (
    <div className="space-y-2" data-testid="label-scanner">
      {problem ? (
        <Notice tone="warning">{problem}</Notice>
      ) : (
        <p className="text-lg">Hold the label&apos;s QR code in the frame.</p>
      )}
      <video ref={video} className="aspect-video w-full max-w-xl rounded-xl bg-bark" muted playsInline />
    </div>
  );
}
