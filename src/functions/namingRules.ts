/**
 * The rules Excel sets for a custom function's id and name, in one place. `npm run metadata`
 * refuses a catalog that breaks them, and the conformance test (test/functions/conformance.test.ts)
 * checks the built functions.json against them.
 *
 * Source: Microsoft, "Custom functions naming and localization", Office Add-ins
 * documentation, https://learn.microsoft.com/office/dev/add-ins/excel/custom-functions-naming
 * (section "Custom functions naming guidelines"): id and name both start with a letter and
 * have at least three characters; an id uses only A–Z, 0–9, underscore and period; a name
 * uses Unicode letters, underscore and period; avoid names that match a cell reference
 * (A1 to XFD1048576, R1C1 to R1048576C16384) or an Excel 4.0 macro function (such as RUN, ECHO).
 */

/** Where the rules are published. */
export const NAMING_RULES_SOURCE = 'https://learn.microsoft.com/office/dev/add-ins/excel/custom-functions-naming';

/** Fewest characters in an id or a name. */
export const MIN_NAME_LENGTH = 3;

/** An id: a letter first, then only A–Z, 0–9, underscore and period. */
export const ID_PATTERN = /^[A-Z][A-Z0-9_.]*$/;

/** A name: a letter first, then Unicode letters, underscore and period. */
export const NAME_PATTERN = /^\p{L}[\p{L}_.]*$/u;

/** Last column (XFD = 16384) and last row of a sheet, the bounds of a cell reference. */
const LAST_COLUMN = 16384;
const LAST_ROW = 1048576;

/** Column number of letters A…XFD (A = 1), or Infinity beyond three letters. */
function columnNumber(letters: string): number {
  if (letters.length > 3) return Infinity;
  return [...letters].reduce((n, c) => n * 26 + (c.charCodeAt(0) - 64), 0);
}

/** True when the text reads as a cell reference: A1…XFD1048576, or R1C1…R1048576C16384 (and RC, R2C, RC3). */
export function isCellReference(text: string): boolean {
  const upper = text.toUpperCase();
  const a1 = /^([A-Z]{1,3})([0-9]+)$/.exec(upper);
  if (a1) {
    const row = Number(a1[2]);
    return columnNumber(a1[1]) <= LAST_COLUMN && row >= 1 && row <= LAST_ROW;
  }
  const r1c1 = /^R([0-9]*)C([0-9]*)$/.exec(upper);
  if (r1c1) {
    const row = r1c1[1] === '' ? 1 : Number(r1c1[1]);
    const column = r1c1[2] === '' ? 1 : Number(r1c1[2]);
    return row >= 1 && row <= LAST_ROW && column >= 1 && column <= LAST_COLUMN;
  }
  return false;
}

/**
 * Excel 4.0 macro-language functions and command equivalents, as the Microsoft Excel
 * Developer's Toolkit (version 5.0) header XLCALL.H names them (its `xlf…` function table
 * and `xlc…` command table, prefix dropped, in its CamelCase: `GetCell` is GET.CELL).
 * A name is compared with its periods removed and case ignored, so `GET.CELL` and `GETCELL`
 * both match `GetCell`. The function table includes the worksheet functions of that
 * version (SUM, INDEX …), which a custom function should not shadow either.
 */
export const EXCEL4_MACRO_NAMES: readonly string[] = // xlf… (functions)
  (
    'Count Isna Iserror Sum Average Min Max Row Column Na Npv Stdev Dollar Fixed Sin Cos Tan Atan Pi Sqrt Exp Ln Log10 Abs Int Sign Round ' +
    'Lookup Index Rept Mid Len Value True False And Or Not Mod Dcount Dsum Daverage Dmin Dmax Dstdev Var Dvar Text Linest Trend Logest Growth ' +
    'Goto Halt Pv Fv Nper Pmt Rate Mirr Irr Rand Match Date Time Day Month Year Weekday Hour Minute Second Now Areas Rows Columns Offset ' +
    'Absref Relref Argument Search Transpose Error Step Type Echo SetName Caller Deref Windows Series Documents ActiveCell Selection Result ' +
    'Atan2 Asin Acos Choose Hlookup Vlookup Links Input Isref GetFormula GetName SetValue Log Exec Char Lower Upper Proper Left Right Exact ' +
    'Trim Replace Substitute Code Names Directory Find Cell Iserr Istext Isnumber Isblank T N Fopen Fclose Fsize Freadln Fread Fwriteln ' +
    'Fwrite Fpos Datevalue Timevalue Sln Syd Ddb GetDef Reftext Textref Indirect Register Call AddBar AddMenu AddCommand EnableCommand ' +
    'CheckCommand RenameCommand ShowBar DeleteMenu DeleteCommand GetChartItem DialogBox Clean Mdeterm Minverse Mmult Files Ipmt Ppmt Counta ' +
    'CancelKey Initiate Request Poke Execute Terminate Restart Help GetBar Product Fact GetCell GetWorkspace GetWindow GetDocument Dproduct ' +
    'Isnontext GetNote Note Stdevp Varp Dstdevp Dvarp Trunc Islogical Dcounta DeleteBar Unregister Usdollar Findb Searchb Replaceb Leftb ' +
    'Rightb Midb Lenb Roundup Rounddown Asc Dbcs Rank Address Days360 Today Vdb Median Sumproduct Sinh Cosh Tanh Asinh Acosh Atanh Dget ' +
    'CreateObject Volatile LastError CustomUndo CustomRepeat FormulaConvert GetLinkInfo TextBox Info Group GetObject Db Pause Resume ' +
    'Frequency AddToolbar DeleteToolbar ResetToolbar Evaluate GetToolbar GetTool SpellingCheck ErrorType AppTitle WindowTitle SaveToolbar ' +
    'EnableTool PressTool RegisterId GetWorkbook Avedev Betadist Gammaln Betainv Binomdist Chidist Chiinv Combin Confidence Critbinom Even ' +
    'Expondist Fdist Finv Fisher Fisherinv Floor Gammadist Gammainv Ceiling Hypgeomdist Lognormdist Loginv Negbinomdist Normdist Normsdist ' +
    'Norminv Normsinv Standardize Odd Permut Poisson Tdist Weibull Sumxmy2 Sumx2my2 Sumx2py2 Chitest Correl Covar Forecast Ftest Intercept ' +
    'Pearson Rsq Steyx Slope Ttest Prob Devsq Geomean Harmean Sumsq Kurt Skew Ztest Large Small Quartile Percentile Percentrank Mode ' +
    'Trimmean Tinv MovieCommand GetMovie Concatenate Power PivotAddData GetPivotTable GetPivotField GetPivotItem Radians Degrees Subtotal ' +
    'Sumif Countif Countblank ScenarioGet OptionsListsGet Ispmt Datedif Datestring Numberstring Roman OpenDialog SaveDialog ' +
    // xlc… (command equivalents)
    'Beep Open OpenLinks CloseAll Save SaveAs FileDelete PageSetup Print PrinterSetup Quit NewWindow ArrangeAll WindowSize WindowMove Full ' +
    'Close Run SetPrintArea SetPrintTitles SetPageBreak RemovePageBreak Font Display ProtectDocument Precision A1R1c1 CalculateNow ' +
    'Calculation DataFind Extract DataDelete SetDatabase SetCriteria Sort DataSeries Table FormatNumber Alignment Style Border ' +
    'CellProtection ColumnWidth Undo Cut Copy Paste Clear PasteSpecial EditDelete Insert FillRight FillDown DefineName CreateNames ' +
    'FormulaGoto FormulaFind SelectLastCell ShowActiveCell GalleryArea GalleryBar GalleryColumn GalleryLine GalleryPie GalleryScatter ' +
    'Combination Preferred AddOverlay Gridlines SetPreferred Axes Legend AttachText AddArrow SelectChart SelectPlotArea Patterns MainChart ' +
    'Overlay Scale FormatLegend FormatText EditRepeat Parse Justify Hide Unhide Workspace Formula FormulaFill FormulaArray DataFindNext ' +
    'DataFindPrev FormulaFindNext FormulaFindPrev Activate ActivateNext ActivatePrev UnlockedNext UnlockedPrev CopyPicture Select ' +
    'DeleteName DeleteFormat Vline Hline Vpage Hpage Vscroll Hscroll Alert New CancelCopy ShowClipboard Message PasteLink AppActivate ' +
    'DeleteArrow RowHeight FormatMove FormatSize FormulaReplace SendKeys SelectSpecial ApplyNames ReplaceFont FreezePanes ShowInfo Split ' +
    'OnWindow OnData DisableInput Echo Outline ListNames FileClose SaveWorkbook DataForm CopyChart OnTime Wait FormatFont FillUp FillLeft ' +
    'DeleteOverlay Note ShortMenus SetUpdateStatus ColorPalette DeleteStyle WindowRestore WindowMaximize Error ChangeLink CalculateDocument ' +
    'OnKey AppRestore AppMove AppSize AppMinimize AppMaximize BringToFront SendToBack MainChartType OverlayChartType SelectEnd OpenMail ' +
    'SendMail StandardFont Consolidate SortSpecial Gallery3dArea Gallery3dColumn Gallery3dLine Gallery3dPie View3d GoalSeek Workgroup ' +
    'FillGroup UpdateLink Promote Demote ShowDetail Ungroup ObjectProperties SaveNewObject Share ShareName Duplicate ApplyStyle ' +
    'AssignToObject ObjectProtection HideObject SetExtract CreatePublisher SubscribeTo Attributes ShowToolbar PrintPreview EditColor ' +
    'ShowLevels FormatMain FormatOverlay OnRecalc EditSeries DefineStyle LinePrint EnterData GalleryRadar MergeStyles EditionOptions ' +
    'PastePicture PastePictureLink Spelling Zoom Resume InsertObject WindowMinimize Size Move SoundNote SoundPlay FormatShape ExtendPolygon ' +
    'FormatAuto Gallery3dBar Gallery3dSurface FillAuto CustomizeToolbar AddTool EditObject OnDoubleclick OnEntry WorkbookAdd WorkbookMove ' +
    'WorkbookCopy WorkbookOptions SaveWorkspace ChartWizard DeleteTool MoveTool WorkbookSelect WorkbookActivate AssignToTool CopyTool ' +
    'ResetTool ConstrainNumeric PasteTool Placement FillWorkgroup WorkbookNew ScenarioCells ScenarioDelete ScenarioAdd ScenarioEdit ' +
    'ScenarioShow ScenarioShowNext ScenarioSummary PivotTableWizard PivotFieldProperties PivotField PivotItem PivotAddFields ' +
    'OptionsCalculation OptionsEdit OptionsView AddinManager MenuEditor AttachToolbars VbaReset OptionsChart Start VbaEnd VbaInsertFile ' +
    'VbaProcedureDefinition VbaReferences VbaStepInto VbaStepOver VbaToggleBreakpoint VbaClearBreakpoints RoutingSlip RouteDocument ' +
    'MailLogon InsertPicture EditTool GalleryDoughnut VbaObjectBrowser VbaDebugWindow VbaAddWatch VbaEditWatch VbaInstantWatch ChartTrend ' +
    'PivotItemProperties WorkbookInsert OptionsTransition OptionsGeneral FilterAdvanced MailAddMailer MailDeleteMailer MailReply ' +
    'MailReplyAll MailForward MailNextLetter DataLabel InsertTitle FontProperties MacroOptions WorkbookHide WorkbookUnhide WorkbookDelete ' +
    'WorkbookName GalleryCustom AddChartAutoformat DeleteChartAutoformat ChartAddData AutoOutline TabOrder ShowDialog SelectAll ' +
    'UngroupSheets SubtotalCreate SubtotalRemove RenameObject WorkbookScroll WorkbookNext WorkbookPrev WorkbookTabSplit FullScreen ' +
    'WorkbookProtect ScrollbarProperties PivotShowPages TextToColumns FormatCharttype LinkFormat TracerDisplay TracerNavigate TracerClear ' +
    'TracerError PivotFieldGroup PivotFieldUngroup CheckboxProperties LabelProperties ListboxProperties EditboxProperties PivotRefresh ' +
    'LinkCombo OpenText HideDialog SetDialogFocus EnableObject PushbuttonProperties SetDialogDefault Filter FilterShowAll ClearOutline ' +
    'FunctionWizard AddListItem SetListItem RemoveListItem SelectListItem SetControlValue SaveCopyAs OptionsListsAdd OptionsListsDelete ' +
    'SeriesAxes SeriesX SeriesY ErrorbarX ErrorbarY FormatChart SeriesOrder MailLogoff ClearRoutingSlip AppActivateMicrosoft ' +
    'MailEditMailer OnSheet StandardWidth ScenarioMerge SummaryInfo FindFile ActiveCellFont EnableTipwizard VbaMakeAddin MailSendMailer'
  ).split(' ');

const MACRO_KEYS = new Set(EXCEL4_MACRO_NAMES.map((n) => n.toUpperCase()));

/** True when the name, periods removed and case ignored, is an Excel 4.0 macro function or command. */
export function isExcel4MacroName(name: string): boolean {
  return MACRO_KEYS.has(name.replace(/\./g, '').toUpperCase());
}

/**
 * Every rule a function's id and name break, as readable lines (empty when both are fine).
 *
 * @param id - the id in functions.json
 * @param name - the name in functions.json
 */
export function namingProblems(id: string, name: string): string[] {
  const problems: string[] = [];
  for (const [label, text, pattern, allowed] of [
    ['id', id, ID_PATTERN, 'A–Z, 0–9, underscore and period'],
    ['name', name, NAME_PATTERN, 'letters, underscore and period'],
  ] as const) {
    if (text.length < MIN_NAME_LENGTH) problems.push(`${label} ${text} has fewer than ${MIN_NAME_LENGTH} characters`);
    if (!pattern.test(text)) problems.push(`${label} ${text} must start with a letter and use only ${allowed}`);
    if (isCellReference(text)) problems.push(`${label} ${text} reads as a cell reference`);
    if (isExcel4MacroName(text)) problems.push(`${label} ${text} is an Excel 4.0 macro function`);
  }
  return problems;
}
