import { Button, type ButtonProps } from '@fluentui/react-components';
import type { MouseEvent, ReactNode } from 'react';
import { useHref, useLinkClickHandler } from 'react-router-dom';

interface LinkButtonProps {
  to: string;
  appearance?: ButtonProps['appearance'];
  icon?: ButtonProps['icon'];
  children: ReactNode;
}

/** A link that looks like a Fluent button and navigates inside the app without a reload. */
export function LinkButton({ to, appearance, icon, children }: LinkButtonProps) {
  const href = useHref(to);
  const handleClick = useLinkClickHandler<HTMLAnchorElement>(to);
  return (
    <Button
      as="a"
      href={href}
      appearance={appearance}
      icon={icon}
      onClick={(event: MouseEvent<HTMLAnchorElement>) => handleClick(event)}
    >
      {children}
    </Button>
  );
}
