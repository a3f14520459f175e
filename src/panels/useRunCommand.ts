import { useCallback } from 'react';
import type { Command } from '../commands/command';
import { useAppStore } from '../store/useAppStore';

/** Runs a command and returns its error message, or null when it ran; for fields that show refusals. */
export function useRunCommand() {
  const execute = useAppStore((s) => s.execute);
  return useCallback(
    <A>(command: Command<A>, args: A): string | null =>
      execute(command, args) ? null : (useAppStore.getState().lastError ?? 'refused'),
    [execute],
  );
}
