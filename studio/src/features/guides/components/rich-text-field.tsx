import '@mantine/tiptap/styles.css';
import { Input } from '@mantine/core';
import { useId } from '@mantine/hooks';
import { Link, RichTextEditor } from '@mantine/tiptap';
import { useEditor } from '@tiptap/react';
import StarterKit from '@tiptap/starter-kit';
import { useEffect, useMemo, useRef, useState } from 'react';

/** Made once: useEditor compares extensions by identity and would reconfigure on every render otherwise. */
const EXTENSIONS = [
  StarterKit.configure({ heading: { levels: [3, 4] }, underline: false, link: false }),
  Link.configure({ protocols: ['http', 'https', 'mailto'], autolink: true, HTMLAttributes: { rel: 'noopener noreferrer nofollow' } }),
];

export interface RichTextFieldProps {
  label: string;
  description?: string;
  error?: string | null;
  /** HTML: the server's sanitised copy, or what this field last gave out. */
  value: string;
  onChange: (html: string) => void;
  minHeight?: number;
  'data-testid'?: string;
}

/**
 * The guide's rich text (summary, step bodies). Offers only what the server keeps after sanitising:
 * paragraphs, bold, italic, strike, code, h3/h4, lists, quotes, rules and http(s)/mailto links, so
 * what the creator sees is what the reader gets.
 */
export function RichTextField({ label, description, error, value, onChange, minHeight = 120, ...rest }: RichTextFieldProps) {
  const labelId = useId();
  const descriptionId = useId();
  const errorId = useId();
  // What the editor last reported, so a value coming back from the parent does not reset the cursor.
  const emitted = useRef(value);
  // Later values arrive through setContent below; passing them as options would only churn the editor.
  const [initialContent] = useState(value);
  const describedBy = [description ? descriptionId : null, error ? errorId : null].filter(Boolean).join(' ') || undefined;
  // The editable area is the textbox a screen reader lands on, so it carries the label and state.
  const editorProps = useMemo(
    () => ({
      attributes: {
        role: 'textbox',
        'aria-multiline': 'true',
        'aria-labelledby': labelId,
        ...(describedBy ? { 'aria-describedby': describedBy } : {}),
        ...(error ? { 'aria-invalid': 'true' } : {}),
        style: `min-height: ${minHeight}px`,
      },
    }),
    [labelId, describedBy, error, minHeight],
  );

  const editor = useEditor({
    extensions: EXTENSIONS,
    content: initialContent,
    // useEditor passes changed options on to the editor, so the label and error wiring stays current.
    editorProps,
    onUpdate: ({ editor: current }) => {
      const html = current.isEmpty ? '' : current.getHTML();
      emitted.current = html;
      onChange(html);
    },
  });

  // The parent replaced the text (a reset after saving, another step opened): show it.
  useEffect(() => {
    if (!editor || value === emitted.current) return;
    emitted.current = value;
    editor.commands.setContent(value, { emitUpdate: false });
  }, [editor, value]);

  return (
    <Input.Wrapper
      labelElement="div"
      label={<span id={labelId}>{label}</span>}
      description={description ? <span id={descriptionId}>{description}</span> : undefined}
      error={error ? <span id={errorId}>{error}</span> : undefined}
      data-testid={rest['data-testid']}
    >
      <RichTextEditor editor={editor} mt={4} style={error ? { borderColor: 'var(--mantine-color-error)' } : undefined}>
        <RichTextEditor.Toolbar>
          <RichTextEditor.ControlsGroup>
            <RichTextEditor.Bold />
            <RichTextEditor.Italic />
            <RichTextEditor.Strikethrough />
            <RichTextEditor.Code />
          </RichTextEditor.ControlsGroup>
          <RichTextEditor.ControlsGroup>
            <RichTextEditor.H3 />
            <RichTextEditor.H4 />
          </RichTextEditor.ControlsGroup>
          <RichTextEditor.ControlsGroup>
            <RichTextEditor.BulletList />
            <RichTextEditor.OrderedList />
            <RichTextEditor.Blockquote />
            <RichTextEditor.Hr />
          </RichTextEditor.ControlsGroup>
          <RichTextEditor.ControlsGroup>
            <RichTextEditor.Link />
            <RichTextEditor.Unlink />
          </RichTextEditor.ControlsGroup>
        </RichTextEditor.Toolbar>
        <RichTextEditor.Content />
      </RichTextEditor>
    </Input.Wrapper>
  );
}
