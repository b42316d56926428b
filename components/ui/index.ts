export { Button, buttonClass, type ButtonTone } from './Button';
export { Field, TextInput, Select, controlClass } from './Field';
export { Notice, type NoticeTone } from './Notice';
export { Panel } from './Panel';
export { PageHeader } from './PageHeader';
export { Tag } from './Tag';
export { DateTime } from './DateTime';
