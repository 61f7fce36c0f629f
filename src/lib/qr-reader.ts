import wasmUrl from 'zxing-wasm/reader/zxing_reader.wasm?url';

/** Reads a QR code from one video frame; null when there is none in it. */
export type FrameReader = (video: HTMLVideoElement) => Promise<string | null>;

interface Detector {
  detect(source: CanvasImageSource): Promise<{ rawValue: string }[]>;
}
type DetectorClass = (new (options: { formats: string[] }) => Detector) & {
  getSupportedFormats(): Promise<string[]>;
};

async function nativeReader(): Promise<FrameReader | null> {
  const Native = (globalThis as { BarcodeDetector?: DetectorClass }).BarcodeDetector;
  if (!Native || !(await Native.getSupportedFormats()).includes('qr_code')) return null;
  const detector = new Native({ formats: ['qr_code'] });
  return async (video) => (await detector.detect(video))[0]?.rawValue ?? null;
}

/**
 * Where the browser has no BarcodeDetector (most desktop and Linux browsers, Firefox), a
 * WebAssembly build of ZXing reads the frames. Its .wasm file is one of the app's own assets,
 * precached with the shell: nothing is fetched from a CDN, and it works offline.
 */
async function wasmReader(): Promise<FrameReader> {
  const { prepareZXingModule, readBarcodes } = await import('zxing-wasm/reader');
  prepareZXingModule({
    overrides: { locateFile: (path: string, prefix: string) => (path.endsWith('.wasm') ? wasmUrl : prefix + path) },
  });
  const canvas = document.createElement('canvas');
  const context = canvas.getContext('2d', { willReadFrequently: true });
  if (!context) throw new Error('This browser cannot draw video frames.');
  return async (video) => {
    if (!video.videoWidth) return null;
    canvas.width = video.videoWidth;
    canvas.height = video.videoHeight;
    context.drawImage(video, 0, 0);
    const frame = context.getImageData(0, 0, canvas.width, canvas.height);
    const [found] = await readBarcodes(frame, { formats: ['QRCode'], tryHarder: true, maxNumberOfSymbols: 1 });
    return found?.isValid ? found.text : null;
  };
}

export async function createFrameReader(): Promise<FrameReader> {
  return (await nativeReader()) ?? wasmReader();
}

/** A jar's QR code holds its page, `${PUBLIC_URL}/j/<label>` (DESIGN.md §5); a bare label is accepted too. */
export function labelFromCode(text: string): string | null {
  const trimmed = text.trim();
  try {
    const match = /\/j\/([^/?#]+)\/?$/.exec(new URL(trimmed).pathname);
    return match?.[1] ? decodeURIComponent(match[1]) : null;
  } catch {
    return /^[A-Za-z0-9][A-Za-z0-9._-]{0,39}$/.test(trimmed) ? trimmed : null;
  }
}
