// Shown with HTTP 403 when a signed-in person opens a page their role does not allow.
import { AccessDenied } from '@/components/layout/access-denied';

export default function Forbidden() {
  return <AccessDenied />;
}
