import type { Metadata } from 'next';
import { SettingsForm } from '@/components/yard/settings-form';
import { Card } from '@/components/ui/field';
import { PageHeader } from '@/components/ui/page-header';
import { requirePageUser } from '@/lib/auth/page-user';
import { getYardSettings } from '@/lib/yard/get-yard-settings';

export const metadata: Metadata = { title: 'Yard settings' };

export default async function SettingsPage() {
  await requirePageUser('settings:edit');
  const s = await getYardSettings();
  return (
    <>
      <PageHeader
        title="Yard settings"
        lead="How the yard cuts and what it charges. The tool counts and cuts timber; it does not size structure."
      />
      <Card>
        <SettingsForm
          initial={{
            yardName: s.yardName,
            kerfMm: s.kerfMm,
            trimMm: s.trimMm,
            minOffcutMm: s.minOffcutMm,
            displayUnit: s.displayUnit,
            region: s.region,
            minSafePieceMm: s.minSafePieceMm,
            lengthToleranceMm: s.lengthToleranceMm,
            perCutChargePence: s.perCutChargePence,
            clearOffcutsAfterDays: s.clearOffcutsAfterDays,
            vatRateBasisPoints: s.vatRateBasisPoints,
            quoteValidityDays: s.quoteValidityDays,
            minimumChargePence: s.minimumChargePence,
            offcutRatePercent: s.offcutRatePercent,
            depositPercent: s.depositPercent,
            yardAddress: s.yardAddress,
            vatNumber: s.vatNumber,
            remaindersGoTo: s.remaindersGoTo,
          }}
        />
      </Card>
    </>
  );
}
