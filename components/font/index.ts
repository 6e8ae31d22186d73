export { FontEditor, type FontEditorProps } from "./FontEditor";
export { FontViewer, type FontViewerProps, type PointMm, type ViewerPin } from "./FontViewer";
export { FontFigures, type FontFiguresProps } from "./FontFigures";
export { FontCautions } from "./FontCautions";
export { ColdWorkingPlanView, type ColdWorkingPlanViewProps } from "./ColdWorkingPlanView";
export { FontSectionDrawing } from "./FontSectionDrawing";
