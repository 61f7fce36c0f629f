import { HistoryImportScreen } from '../../features/imports/components/history-import-screen';

export function HistoryImportRoute() {
  return (
    <>
      <title>History import · Asepta</title>
      <HistoryImportScreen />
    </>
  );
}
