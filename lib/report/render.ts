import "server-only";
import { renderToBuffer, type DocumentProps } from "@react-pdf/renderer";
import { createElement, type ReactElement } from "react";
import { registerPdfFonts } from "@/templates/fonts";
import { ReportDocument } from "@/templates/report";
import type { TReportData } from "./types";

/** The report as a PDF (A4, Noto Sans, photos from their report variants). */
export async function renderReportPdf(data: TReportData): Promise<Buffer> {
  registerPdfFonts();
  return renderToBuffer(createElement(ReportDocument, { data }) as unknown as ReactElement<DocumentProps>);
}
