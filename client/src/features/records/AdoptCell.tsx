import type { ReactNode } from 'react';
import type { Adoptable } from '../../../../shared/api/records';
import { Button } from '../../shared/components/Button';

/**
 * How an estimate table offers adoption: which estimate's panel is open, how to open one,
 * and the panel itself, which the table shows right below itself.
 */
export type AdoptSlot = {
  activeKey: string | null;
  open: (estimate: Adoptable) => void;
  panel: ReactNode;
};

const actions: Record<Adoptable['target'], string> = {
  profile: 'Adopt into a profile',
  step: 'Adopt into a step',
  'field-seedbank': 'Set as initial seedbank',
};

/** The table cell with the adopt action, or why the estimate cannot be adopted. */
export function AdoptCell({ estimate, slot }: { estimate: Adoptable; slot: AdoptSlot | undefined }) {
  if (!slot) return null;
  if (!estimate.ok) {
    return <span className="text-sm text-loam-700">Not adoptable: {estimate.reason}</span>;
  }
  const open = slot.activeKey === estimate.key;
  return (
    <Button
      variant={open ? 'primary' : 'secondary'}
      size="sm"
      aria-expanded={open}
      aria-label={`${actions[estimate.target]}: ${estimate.label}`}
      onClick={() => slot.open(estimate)}
      className="whitespace-nowrap"
    >
      {actions[estimate.target]}…
    </Button>
  );
}

/** The open adopt panel, when it belongs to one of these estimates. */
export function AdoptPanelFor({ keys, slot }: { keys: readonly string[]; slot: AdoptSlot | undefined }) {
  if (!slot || slot.activeKey === null || !keys.includes(slot.activeKey)) return null;
  return <>{slot.panel}</>;
}
