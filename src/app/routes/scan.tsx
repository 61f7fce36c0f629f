import { ScanScreen } from '../../features/scanner/components/scan-screen';

export function ScanRoute() {
  return (
    <>
      <title>Scan a jar · Asepta</title>
      <ScanScreen />
    </>
  );
}
