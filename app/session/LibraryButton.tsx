/** The top bar's way into the library. */
import { useSession } from './SessionProvider.tsx';

export function LibraryButton() {
  const session = useSession();
  return (
    <button
      type="button"
      className="rc-lib-open"
      data-testid="open-library"
      title="All your designs, recently deleted ones and this design's history"
      onClick={() => session.setView('designs')}
    >
      Designs
    </button>
  );
}
