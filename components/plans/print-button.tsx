'use client';

import { Button } from '@/components/ui/button';

export function PrintButton() {
  return (
    <Button className="no-print" onClick={() => window.print()}>
      Print cut sheet
    </Button>
  );
}
