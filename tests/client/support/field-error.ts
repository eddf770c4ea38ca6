// Reads what a screen reader hears as a field's description: its hint and error text.
export function descriptionOf(control: HTMLElement): string {
  const ids = control.getAttribute('aria-describedby')?.split(/\s+/).filter(Boolean) ?? [];
  return ids.map((id) => document.getElementById(id)?.textContent ?? '').join(' ');
}
