import { Component, type ReactNode } from 'react';
import { Alert } from '../../../components/ui/Alert';

interface State {
  failed: boolean;
}

/** A 3D view that cannot start (no WebGL, a file three.js cannot read) must not take the numbers down with it. */
export class SceneErrorBoundary extends Component<{ children: ReactNode }, State> {
  override state: State = { failed: false };

  static getDerivedStateFromError(): State {
    return { failed: true };
  }

  override render() {
    if (this.state.failed) {
      return (
        <Alert tone="info" title="The 3D view could not start" live="none">
          This browser could not draw the mould in 3D. Every number on this page still holds; the description below the view says what it would show.
        </Alert>
      );
    }
    return this.props.children;
  }
}
