import { downloadText, toCsv } from './csv';

type Props = {
  filename: string;
  header: readonly string[];
  rows: ReadonlyArray<ReadonlyArray<string | number | null>>;
  label?: string;
};

export function CsvButton({ filename, header, rows, label = 'Download CSV' }: Props) {
  return (
    <button type="button" className="cw-btn cw-btn-quiet cw-btn-small" onClick={() => downloadText(filename, toCsv(header, rows))}>
      {label}
      <span className="sr-only"> ({filename})</span>
    </button>
  );
}
