/**
 * Renderer entry: mounts the app on the built-in demo design and the invented demo part library.
 * No inline script anywhere (the page's CSP allows scripts from 'self' only); zod runs jitless (the
 * engine switches it on when its schemas load).
 */
import { mount } from 'svelte';
import { validateDesign, validatePartsLibrary } from '../shared-model/index.ts';
import demoDesignJson from '../assets/designs/synchronous-buck.json';
import demoLibraryJson from '../assets/parts/library.json';
import App from './App.svelte';
import './app.css';

function start(): void {
  const target = document.getElementById('app');
  if (!target) throw new Error('index.html has no #app element');
  const design = validateDesign(demoDesignJson);
  const library = validatePartsLibrary(demoLibraryJson);
  if (!design.ok || !library.ok) {
    // A broken build, not a user error: say what is wrong instead of showing a blank window.
    const problems = [...(design.ok ? [] : design.problems), ...(library.ok ? [] : library.problems)];
    target.textContent = `The built-in demo data is invalid: ${problems.map((p) => p.message).join(' ')}`;
    return;
  }
  mount(App, { target, props: { demoDesign: design.design, demoParts: library.library.parts } });
}

start();
