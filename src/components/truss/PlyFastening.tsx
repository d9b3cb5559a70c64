import type { PresentedDesign } from '../../../shared/engine/design';
import { Badge, Card } from '../ui';
import { formatCsi } from './csi';

/** A girder's ply-to-ply fastening per chord, with its ratio; nothing for a one-ply truss. */
export function PlyFastening({ design }: { design: PresentedDesign }) {
  const rows = design.plyConnections;
  if (!rows || rows.length === 0) return null;
  return (
    <Card title="Ply-to-ply fastening">
      <ul className="flex flex-col gap-2 text-sm" data-testid="ply-fastening">
        {rows.map((r) => (
          <li key={r.chord} className="flex items-start gap-2">
            <Badge tone={r.pass ? 'success' : 'danger'}>{formatCsi(r.ratio)}</Badge>
            <span>{r.text}</span>
          </li>
        ))}
      </ul>
    </Card>
  );
}
