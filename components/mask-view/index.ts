export { MaskView, type MaskViewProps, type MaskMarker, type MaskPin } from './MaskView';
export { flattenLibrary, type FlatMask, type Bounds } from './flatten';
