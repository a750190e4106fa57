import { createContext, use, type HTMLAttributes } from 'react';

const InsideMain = createContext(false);

/**
 * The page's one `<main>`: a page shown inside another main (an error page inside the app shell)
 * renders a plain block instead, so there is never a second main landmark.
 */
export function MainLandmark({ children, ...props }: HTMLAttributes<HTMLElement>) {
  const nested = use(InsideMain);
  if (nested) return <div {...props}>{children}</div>;
  return (
    <main {...props}>
      <InsideMain value={true}>{children}</InsideMain>
    </main>
  );
}
