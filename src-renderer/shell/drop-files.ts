/**
 * Opening a design by dropping a .json file anywhere on the window. Returns a function that stops it.
 * `onDragState` drives the drop hint; `onFile` receives the first dropped file.
 */
export function listenForDroppedFiles(onFile: (file: File) => void, onDragState: (dragging: boolean) => void): () => void {
  let depth = 0;
  const hasFiles = (event: DragEvent) => event.dataTransfer?.types.includes('Files') ?? false;
  const enter = (event: DragEvent) => {
    if (!hasFiles(event)) return;
    depth++;
    onDragState(true);
  };
  const leave = (event: DragEvent) => {
    if (!hasFiles(event)) return;
    depth = Math.max(0, depth - 1);
    if (depth === 0) onDragState(false);
  };
  const over = (event: DragEvent) => {
    if (!hasFiles(event)) return;
    event.preventDefault();
    if (event.dataTransfer) event.dataTransfer.dropEffect = 'copy';
  };
  const drop = (event: DragEvent) => {
    if (!hasFiles(event)) return;
    event.preventDefault();
    depth = 0;
    onDragState(false);
    const file = event.dataTransfer?.files[0];
    if (file) onFile(file);
  };
  window.addEventListener('dragenter', enter);
  window.addEventListener('dragleave', leave);
  window.addEventListener('dragover', over);
  window.addEventListener('drop', drop);
  return () => {
    window.removeEventListener('dragenter', enter);
    window.removeEventListener('dragleave', leave);
    window.removeEventListener('dragover', over);
    window.removeEventListener('drop', drop);
  };
}
