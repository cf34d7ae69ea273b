import { Component, type ErrorInfo, type ReactNode } from 'react';
import { ErrorPanel } from './error-panel';

interface RegionErrorBoundaryProps {
  /** Names the region in the message, e.g. "this page" or "the chart". */
  region: string;
  children: ReactNode;
}

interface RegionErrorBoundaryState {
  error: Error | null;
}

/** Keeps a failure inside one region: the rest of the screen stays usable. */
export class RegionErrorBoundary extends Component<RegionErrorBoundaryProps, RegionErrorBoundaryState> {
  override state: RegionErrorBoundaryState = { error: null };

  static getDerivedStateFromError(error: Error): RegionErrorBoundaryState {
    return { error };
  }

  override componentDidCatch(error: Error, info: ErrorInfo): void {
    console.error(`Channelwright: ${this.props.region} failed`, error, info.componentStack);
  }

  private readonly retry = () => this.setState({ error: null });

  override render() {
    const { error } = this.state;
    if (!error) return this.props.children;
    return <ErrorPanel title={`Something went wrong in ${this.props.region}`} message={error.message} onRetry={this.retry} />;
  }
}
