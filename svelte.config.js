// Svelte 5 compiles TypeScript in <script lang="ts"> natively; no preprocessor is needed.
export default {};
