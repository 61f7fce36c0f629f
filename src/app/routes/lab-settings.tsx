import { LabSettingsScreen } from '../../features/settings/components/lab-settings-screen';

export function LabSettingsRoute() {
  return (
    <>
      <title>Lab settings · Asepta</title>
      <LabSettingsScreen />
    </>
  );
}
