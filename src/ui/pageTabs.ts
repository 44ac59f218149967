/** The page's tabs (WAI-ARIA tabs pattern: arrow keys, Home and End move between them). */
import { TAB_IDS, type TabId } from './viewState';
import { byId } from './views/present';

export function wireTabs(select: (tab: TabId) => void): void {
  const tabs = [...document.querySelectorAll<HTMLButtonElement>('[role="tab"]')];
  for (const tab of tabs) {
    tab.addEventListener('click', () => select(tab.dataset.tab as TabId));
    tab.addEventListener('keydown', (e) => {
      const i = tabs.indexOf(tab);
      let j = -1;
      if (e.key === 'ArrowRight') j = (i + 1) % tabs.length;
      else if (e.key === 'ArrowLeft') j = (i - 1 + tabs.length) % tabs.length;
      else if (e.key === 'Home') j = 0;
      else if (e.key === 'End') j = tabs.length - 1;
      if (j >= 0) {
        e.preventDefault();
        select(tabs[j]!.dataset.tab as TabId);
        tabs[j]!.focus();
      }
    });
  }
}

/** Show one tab's panel and mark its button selected (focusing it when asked). */
export function showTabPanel(tab: TabId, focus: boolean): void {
  for (const id of TAB_IDS) {
    const button = byId(`tab-${id}`);
    const selected = id === tab;
    button.setAttribute('aria-selected', String(selected));
    button.tabIndex = selected ? 0 : -1;
    byId(`panel-${id}`).hidden = !selected;
    if (selected && focus) button.focus();
  }
}
