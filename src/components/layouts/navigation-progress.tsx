import { useNavigation } from 'react-router-dom';

/** A thin copper line at the top while the next screen's data loads. */
export function NavigationProgress() {
  const navigation = useNavigation();
  if (navigation.state === 'idle') return null;
  return (
    <div role="progressbar" aria-label="Loading the next page" className="fixed inset-x-0 top-0 z-50 h-0.5 overflow-hidden bg-copper/20">
      <div className="h-full w-1/3 animate-pulse bg-copper motion-reduce:animate-none" />
    </div>
  );
}
