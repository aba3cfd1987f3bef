'use client';

import { useCallback, useEffect, useRef, useState, type DragEvent, type InputHTMLAttributes, type RefObject } from 'react';

const carriesFiles = (e: DragEvent | globalThis.DragEvent) => Array.from(e.dataTransfer?.types ?? []).includes('Files');

/**
 * Drag-and-drop onto a zone plus a hidden native file input, without a library. Hands every dropped or chosen file to
 * `onFiles`; checking type, size and count is the caller's job, so it can say in its own words what was wrong.
 */
export function useFileDrop({ onFiles, accept, disabled }: { onFiles: (files: File[]) => void; accept: string; disabled: boolean }) {
  const rootRef = useRef<HTMLDivElement>(null);
  const inputRef = useRef<HTMLInputElement>(null);
  // dragenter and dragleave fire for every child the pointer crosses: the zone is active while any entered child remains.
  const entered = useRef<EventTarget[]>([]);
  const [isDragActive, setDragActive] = useState(false);

  useEffect(() => {
    // A file dropped beside the zone (or on it while it is busy) would otherwise open in the tab and leave the page.
    const keepPage = (e: globalThis.DragEvent) => {
      if (carriesFiles(e) && !e.defaultPrevented) e.preventDefault();
    };
    document.addEventListener('dragover', keepPage);
    document.addEventListener('drop', keepPage);
    return () => {
      document.removeEventListener('dragover', keepPage);
      document.removeEventListener('drop', keepPage);
    };
  }, []);

  const open = useCallback(() => {
    const input = inputRef.current;
    if (!input || disabled) return;
    // Choosing the same file again must still report it.
    input.value = '';
    input.click();
  }, [disabled]);

  const rootProps = disabled
    ? {}
    : {
        onDragEnter: (e: DragEvent) => {
          if (!carriesFiles(e)) return;
          e.preventDefault();
          entered.current = [...entered.current.filter((t) => rootRef.current?.contains(t as Node)), e.target];
          setDragActive(true);
        },
        onDragOver: (e: DragEvent) => {
          if (!carriesFiles(e)) return;
          e.preventDefault();
          e.dataTransfer.dropEffect = 'copy';
        },
        onDragLeave: (e: DragEvent) => {
          entered.current = entered.current.filter((t) => t !== e.target && rootRef.current?.contains(t as Node));
          if (entered.current.length === 0) setDragActive(false);
        },
        onDrop: (e: DragEvent) => {
          if (!carriesFiles(e)) return;
          e.preventDefault();
          entered.current = [];
          setDragActive(false);
          onFiles(Array.from(e.dataTransfer.files));
        },
      };

  const inputProps: InputHTMLAttributes<HTMLInputElement> & { ref: RefObject<HTMLInputElement | null> } = {
    ref: inputRef,
    type: 'file',
    accept,
    multiple: false,
    tabIndex: -1,
    // In the flow but invisible and zero-sized: the visible button opens it.
    style: { border: 0, display: 'block', height: 0, margin: 0, maxWidth: 0, opacity: 0, overflow: 'hidden', padding: 0, width: 0 },
    onChange: (e) => {
      if (disabled) return;
      const files = Array.from(e.currentTarget.files ?? []);
      if (files.length) onFiles(files);
    },
  };

  // A drag under way when the zone turns busy stops counting: its drop will not be taken.
  return { rootRef, rootProps, inputProps, open, isDragActive: isDragActive && !disabled };
}
