import { useId } from 'react';
import { commonCurrencies } from '../../lib/trade-labels';
import { TextField, type TextFieldProps } from './text-field';

/**
 * A three-letter ISO 4217 code with the common ones offered as suggestions; the schema
 * behind the form decides what is valid, so an uncommon code can still be typed.
 */
export function CurrencyField(props: TextFieldProps) {
  const listId = useId();
  return (
    <>
      <TextField
        autoComplete="off"
        spellCheck={false}
        maxLength={3}
        list={listId}
        placeholder="USD"
        className="w-28"
        {...props}
        style={{ textTransform: 'uppercase', ...props.style }}
      />
      <datalist id={listId}>
        {commonCurrencies.map((code) => (
          <option key={code} value={code} />
        ))}
      </datalist>
    </>
  );
}
