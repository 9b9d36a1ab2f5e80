import { Tag } from '../../../components/ui/tag';
import type { BomState } from '../../../shared/schemas/boms';
import { bomStateLabels } from '../display';

const tones = { draft: 'neutral', in_review: 'copper', released: 'ok' } as const;

/** A BOM's state in words (Draft, In review, Released). */
export function StateBadge({ state }: { state: BomState }) {
  return <Tag tone={tones[state]}>{bomStateLabels[state]}</Tag>;
}
