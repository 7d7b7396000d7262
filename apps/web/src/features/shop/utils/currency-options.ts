import type { SelectOption } from '../../../components/ui/Select';

/**
 * Every ISO 4217 code the browser can write money in (ECMA-402 Intl.supportedValuesOf), each with its name in the
 * reader's language, e.g. "CAD · Canadian Dollar". The shop's own code stays in the list even where the browser
 * does not know it, so the form never silently changes it.
 */
export function currencyOptions(current: string, locale?: string): SelectOption[] {
  const names = new Intl.DisplayNames(locale, { type: 'currency', fallback: 'code' });
  const codes = new Set(Intl.supportedValuesOf('currency'));
  codes.add(current);
  return [...codes].sort().map((code) => {
    const name = names.of(code);
    return { value: code, label: name && name !== code ? `${code} · ${name}` : code };
  });
}
