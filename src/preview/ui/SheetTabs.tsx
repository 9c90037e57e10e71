interface SheetTabsProps {
  sheets: string[];
  active: string;
  onActivate(name: string): void;
}

export function SheetTabs({ sheets, active, onActivate }: SheetTabsProps) {
  return (
    <nav class="sheet-tabs" role="tablist" aria-label="Sheets">
      {sheets.map((name) => (
        <button
          key={name}
          type="button"
          role="tab"
          aria-selected={name === active}
          class={name === active ? 'tab active' : 'tab'}
          onClick={() => onActivate(name)}
        >
          {name}
        </button>
      ))}
    </nav>
  );
}
