// One printable offcut label: the tag as text and as a QR code, section, length, date and place.
import QRCode from 'qrcode';
import { formatLength, type DisplayUnit } from '@/lib/units';
import type { OffcutBrief } from '@/lib/saw/find-offcut';
import { RackLocationForm } from './rack-location-form';

export async function OffcutLabel({ offcut, unit }: { offcut: OffcutBrief; unit: DisplayUnit }) {
  // The QR holds the tag alone, so any reader (ours or a phone's) shows something a person can read.
  const svg = await QRCode.toString(offcut.tag, { type: 'svg', errorCorrectionLevel: 'M', margin: 0 });
  return (
    <article className="offcut-label" data-testid={`label-${offcut.tag}`}>
      <div className="label-face">
        <div
          className="label-qr"
          dangerouslySetInnerHTML={{ __html: svg }}
          aria-label={`QR code for ${offcut.tag}`}
          role="img"
        />
        <div className="label-text">
          <p className="label-tag">{offcut.tag}</p>
          <p className="label-length">{formatLength(offcut.lengthMm, unit, { withUnit: true })}</p>
          <p className="label-section">{offcut.sectionName}</p>
          <p className="label-meta">{offcut.createdAt.toISOString().slice(0, 10)}</p>
          <p className="label-meta">{offcut.location}</p>
        </div>
      </div>
      <RackLocationForm offcutId={offcut.id} location={offcut.location} />
    </article>
  );
}
