/**
 * What is wrong with on-device storage right now, in words a surveyor can act on.
 * Null when all is well.
 */
export type ConnectionProblem = 'blocked' | 'version-change' | 'terminated';

const MESSAGES: Record<ConnectionProblem, string> = {
  blocked: 'Ventwalk is open in another tab or window on an older version. Close the others so this one can open its data.',
  'version-change': 'A newer version of Ventwalk has opened in another tab. Reload this one to carry on; your saved work is safe.',
  terminated: 'The browser closed the connection to stored data. It will reopen on the next save.',
};

class ConnectionState {
  problem = $state<ConnectionProblem | null>(null);

  get message(): string | null {
    return this.problem ? MESSAGES[this.problem] : null;
  }

  report(problem: ConnectionProblem): void {
    this.problem = problem;
  }

  clear(): void {
    this.problem = null;
  }
}

export const connectionState = new ConnectionState();
