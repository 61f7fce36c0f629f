import { useEffect, useRef, useState } from 'react';
import { useNavigate } from 'react-router';
import { Notice } from '../../../components/ui/notice';
import { PageHeader } from '../../../components/ui/page-header';
import { paths } from '../../../config/paths';
import { createFrameReader, labelFromCode } from '../../../lib/qr-reader';

const frameGapMs = 150;

function cameraProblem(error: unknown): string {
  if (!window.isSecureContext)
    return 'The camera only works on a secure page. Open Asepta over HTTPS (see the README), or use the phone’s own camera app on the label.';
  if (error instanceof DOMException && error.name === 'NotAllowedError')
    return 'Camera access was refused. Allow the camera for this site in the browser’s settings, then try again.';
  if (error instanceof DOMException && error.name === 'NotFoundError') return 'This device has no camera.';
  return error instanceof Error ? error.message : 'The camera could not be started.';
}

/** Point the back camera at a jar's label: the jar's page opens as soon as its QR code is read. */
export function ScanScreen() {
  const video = useRef<HTMLVideoElement>(null);
  const navigate = useNavigate();
  const [problem, setProblem] = useState<string>();
  const [unknownCode, setUnknownCode] = useState<string>();

  useEffect(() => {
    let stopped = false;
    let stream: MediaStream | undefined;
    const run = async () => {
      try {
        stream = await navigator.mediaDevices.getUserMedia({ video: { facingMode: 'environment' }, audio: false });
        if (stopped || !video.current) return;
        video.current.srcObject = stream;
        await video.current.play();
        const read = await createFrameReader();
        while (!stopped) {
          const text = await read(video.current);
          const label = text ? labelFromCode(text) : null;
          if (label) return void navigate(paths.jarPage.to(label));
          if (text) setUnknownCode(text);
          await new Promise((resolve) => window.setTimeout(resolve, frameGapMs));
        }
      } catch (error) {
        if (!stopped) setProblem(cameraProblem(error));
      }
    };
    void run();
    return () => {
      stopped = true;
      stream?.getTracks().forEach((t) => t.stop());
    };
  }, [navigate]);

  return (
    <div className="mx-auto max-w-xl space-y-4">
      <PageHeader title="Scan a jar" description="Hold the label’s QR code in the frame." />
      {problem ? (
        <Notice tone="danger" title="No camera">
          {problem}
        </Notice>
      ) : (
        <video
          ref={video}
          muted
          playsInline
          aria-label="Camera view"
          className="aspect-[3/4] w-full rounded-xl bg-ink object-cover"
        />
      )}
      {unknownCode && (
        <Notice tone="warn" title="That code is not a jar label.">
          It reads “{unknownCode.slice(0, 80)}”.
        </Notice>
      )}
    </div>
  );
}
