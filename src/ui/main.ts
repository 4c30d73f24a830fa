/**
 * The app's entry point in a browser or the desktop shell: styles, the chart palette as
 * CSS custom properties, then the app itself.
 */
import { mount } from 'svelte';
import { englishLocales } from '../locale/english.ts';
import { colourPalette } from '../render/palette.ts';
import App from './App.svelte';
import { browserPlatform } from './platform/browser-platform.ts';
import { desktopPlatform } from './platform/desktop-platform.ts';
import { FIRST_DEMO, loadDemoTopics } from './state/demo-topics.ts';
import './styles/app.css';

/** Share the people charts' colours with the rest of the interface (set through the CSSOM, which the policy allows). */
function applyPaletteTokens(root: HTMLElement): void {
  const { groups } = colourPalette;
  root.style.setProperty('--benefit-fill', groups.helped.fill);
  root.style.setProperty('--benefit', groups.helped.outline);
  root.style.setProperty('--harm-fill', groups.harmed.fill);
  root.style.setProperty('--harm', groups.harmed.outline);
  root.style.setProperty('--event-fill', groups.event.fill);
}

applyPaletteTokens(document.documentElement);
const target = document.getElementById('app');
if (target === null) throw new Error('the page has no #app element');
// The desktop shell's preload puts its API on window.chancewise; a plain browser has none.
const shell = window.chancewise;
mount(App, {
  target,
  props: {
    platform: shell === undefined ? browserPlatform() : desktopPlatform(shell),
    // The app opens on the first example; the Topics panel loads the others when it lists them.
    demos: FIRST_DEMO === null ? [] : [FIRST_DEMO],
    loadDemos: loadDemoTopics,
    locales: englishLocales,
  },
});
