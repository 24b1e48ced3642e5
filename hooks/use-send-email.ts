import type { UseMutationResult } from '@tanstack/react-query';
import { useState } from 'react';
import type { ZodType } from 'zod';
import { ApiError } from './api-client';

interface Options<Body, Result> {
  /** The send mutation (record report, proposal). */
  send: UseMutationResult<Result, Error, Body>;
  /** The job's contact address, until the user types another. */
  defaultAddress: string;
  /** The shared schema of the request body, so the dialog shows the server's own message for a bad address. */
  schema: ZodType<Body>;
  /** The request body for an address; `confirm` once the user said "send again". */
  bodyOf(address: string, confirm: boolean): unknown;
}

/**
 * The state behind an "e-mail it to the customer" dialog: the address (the job's contact unless changed), its
 * validation, and the server's question when the same PDF went out under a minute ago (409 `recently-sent`).
 * Spread `dialog` into `SendEmailDialog`; `open()` shows it.
 */
export function useSendEmail<Body, Result>({ send, defaultAddress, schema, bodyOf }: Options<Body, Result>) {
  const [visible, setVisible] = useState(false);
  const [to, setTo] = useState<string | null>(null);
  const [addressError, setAddressError] = useState<string>();
  const [askAgain, setAskAgain] = useState<string | null>(null);
  const address = to ?? defaultAddress;

  const onSend = (confirm: boolean) => {
    const parsed = schema.safeParse(bodyOf(address, confirm));
    if (!parsed.success) {
      setAddressError(parsed.error.issues[0]?.message);
      return;
    }
    setAddressError(undefined);
    send.mutate(parsed.data, {
      onSuccess: () => {
        setVisible(false);
        setAskAgain(null);
      },
      onError: (err) => {
        if (err instanceof ApiError && err.code === 'recently-sent') setAskAgain(err.message);
      },
    });
  };

  return {
    open: () => setVisible(true),
    dialog: {
      visible,
      address,
      addressError,
      askAgain,
      pending: send.isPending,
      error: send.isError ? send.error : null,
      onAddressChange: (value: string) => {
        setTo(value);
        setAskAgain(null);
      },
      onSend,
      onDismiss: () => setVisible(false),
    },
  };
}
