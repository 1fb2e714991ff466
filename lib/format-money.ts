/** Money is held in minor units with a currency; format it for people (e.g. 9500 GBP → "£95.00"). */
export function formatMoney(amountMinor: number, currency: string, locale = "en-GB"): string {
  const digits =
    new Intl.NumberFormat(locale, { style: "currency", currency }).resolvedOptions()
      .maximumFractionDigits ?? 2;
  return new Intl.NumberFormat(locale, { style: "currency", currency }).format(
    amountMinor / 10 ** digits,
  );
}
