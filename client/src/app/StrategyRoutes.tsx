import { useMemo } from 'react';
import { useFields } from '../features/fields/api';
import { StrategiesPage } from '../features/strategies/StrategiesPage';
import { NewStrategyPage, StrategyPage } from '../features/strategies/StrategyPages';
import type { FieldOption } from '../features/strategies/StrategyBuilder';
import { LoadingNotice } from '../shared/components/Notice';
import { useCurrentWorkspace } from '../shared/lib/currentWorkspace';

/*
 * The strategy pages show which field a strategy belongs to, and the builder offers the
 * workspace's fields (their crop picks the recorded maximum rates that apply). The fields
 * come from the fields feature, so the two are put together here. The builder waits for
 * the field list only as long as it loads; if it fails, strategies still open, without
 * field names.
 */
function useFieldOptions(): FieldOption[] | null {
  const workspace = useCurrentWorkspace();
  const fields = useFields(workspace.id);
  return useMemo(() => {
    if (fields.isPending) return null;
    return (fields.data ?? []).map((f) => ({ id: f.id, name: f.name, crop: f.crop }));
  }, [fields.isPending, fields.data]);
}

export function StrategiesRoute() {
  const fields = useFieldOptions();
  const names = useMemo(() => Object.fromEntries((fields ?? []).map((f) => [f.id, f.name])), [fields]);
  return <StrategiesPage fieldNames={names} />;
}

export function StrategyRoute() {
  const fields = useFieldOptions();
  return fields ? <StrategyPage fields={fields} /> : <LoadingNotice>Loading the strategy…</LoadingNotice>;
}

export function NewStrategyRoute() {
  const fields = useFieldOptions();
  return fields ? <NewStrategyPage fields={fields} /> : <LoadingNotice>Loading…</LoadingNotice>;
}
