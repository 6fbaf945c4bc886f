// Keeps one failing part of the window from blanking the rest: the part shows what went wrong and
// a retry button, while the plan, the map or the tables elsewhere stay usable.

import { Component, type ReactNode } from 'react';

interface State {
  error: Error | null;
}

export class ErrorBoundary extends Component<{ what: string; children: ReactNode }, State> {
  override state: State = { error: null };

  static getDerivedStateFromError(error: Error): State {
    return { error };
  }

  override render() {
    if (!this.state.error) return this.props.children;
    return (
      <div className="lw-error" role="alert">
        The {this.props.what} failed: {this.state.error.message}{' '}
        <button type="button" onClick={() => this.setState({ error: null })}>
          Try again
        </button>
      </div>
    );
  }
}
