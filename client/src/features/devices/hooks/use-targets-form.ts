import { useForm } from '@mantine/form';
import { DEFAULT_TARGETS, type TargetsValues } from '../model/targets';

/** The targets form's state (controlled: the results follow every keystroke). */
export function useTargetsForm(initial: Partial<TargetsValues> = {}) {
  const form = useForm<TargetsValues>({ mode: 'controlled', initialValues: { ...DEFAULT_TARGETS, ...initial } });
  const setField = <K extends keyof TargetsValues>(field: K, value: TargetsValues[K]) =>
    form.setFieldValue(field, value as never);
  return { form, values: form.values, setField };
}
