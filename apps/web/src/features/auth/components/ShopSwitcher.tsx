import type { MeResponse, SessionResponse } from '@gelpoint/contracts';
import { useId, useState } from 'react';
import { Button } from '../../../components/ui/Button';
import { errorNotice } from '../../../lib/error-notice';
import { useSwitchShop } from '../api/switch-shop';

export interface ShopSwitcherProps {
  session: MeResponse;
  onSwitched: (session: SessionResponse) => unknown;
}

/** The current shop's name; with several shops, a choice of shop and a button to move to it. */
export function ShopSwitcher({ session, onSwitched }: ShopSwitcherProps) {
  const selectId = useId();
  const errorId = useId();
  const [chosen, setChosen] = useState(session.shop.id);
  const switchShop = useSwitchShop({ onSuccess: onSwitched });

  if (session.shops.length < 2) {
    return (
      <p className="flex min-h-touch items-center gap-2">
        <span className="text-sm text-walnut-200">Shop</span>
        <span className="font-semibold">{session.shop.name}</span>
      </p>
    );
  }

  return (
    <form
      className="flex flex-wrap items-center gap-2"
      onSubmit={(event) => {
        event.preventDefault();
        if (chosen !== session.shop.id) switchShop.mutate({ shopId: chosen });
      }}
    >
      <label htmlFor={selectId} className="text-sm text-walnut-200">
        Shop
      </label>
      <select
        id={selectId}
        value={chosen}
        onChange={(event) => setChosen(event.target.value)}
        aria-describedby={switchShop.isError ? errorId : undefined}
        className="min-h-touch min-w-0 flex-1 rounded-lg border border-walnut-400 bg-walnut-900 px-3 font-semibold text-paper md:flex-none"
      >
        {session.shops.map((shop) => (
          <option key={shop.shopId} value={shop.shopId}>
            {shop.shopName}
          </option>
        ))}
      </select>
      <Button type="submit" variant="secondary" busy={switchShop.isPending} disabled={chosen === session.shop.id}>
        Switch
      </Button>
      {switchShop.isError ? (
        <p id={errorId} role="alert" className="w-full text-sm font-semibold text-resin-200">
          {errorNotice(switchShop.error).message}
        </p>
      ) : null}
    </form>
  );
}
