import { Component, type ErrorInfo, type ReactNode } from 'react';
import { ErrorMessage } from './error-message';

interface State {
  failed: boolean;
}

/**
 * The last line of defence around the whole app (the router catches errors inside pages and
 * keeps the area's frame; this catches what happens outside it).
 */
export class AppErrorBoundary extends Component<{ children: ReactNode }, State> {
  override state: State = { failed: false };

  static getDerivedStateFromError(): State {
    return { failed: true };
  }

  override componentDidCatch(error: Error, info: ErrorInfo): void {
    console.error('Liftwright stopped with an error', error, info.componentStack);
  }

  override render() {
    return this.state.failed ? <ErrorMessage /> : this.props.children;
  }
}
