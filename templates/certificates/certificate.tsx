import { Document, Page, StyleSheet, Text, View } from '@react-pdf/renderer';
import type { PrintPaper } from '@shared/schemas/results';
import { DISPLAY, TEXT } from '../cards/fonts';
import { GRAPHITE, INK, RULE, SIGNAL } from '../cards/theme';
import type { CertificateContent } from './content';
import { caps, MARGIN, pageSize, TEXT_INSET } from './style';

// A workshop data sheet turned award: a heavy ink frame, one signal bar, the award set large in Oswald.
const c = StyleSheet.create({
  page: { padding: MARGIN, fontFamily: TEXT, color: INK, backgroundColor: '#FFFFFF' },
  frame: { flex: 1, borderWidth: 4, borderColor: INK, padding: 6 },
  inner: { flex: 1, borderWidth: 0.75, borderColor: INK, paddingHorizontal: 36 + TEXT_INSET, paddingVertical: 40, alignItems: 'center', justifyContent: 'space-between' },
  top: { alignItems: 'center' },
  brand: { fontFamily: DISPLAY, fontWeight: 600, fontSize: 10, letterSpacing: 4, color: SIGNAL },
  show: { fontFamily: DISPLAY, fontWeight: 500, fontSize: 20, textAlign: 'center', marginTop: 14 },
  meta: { fontSize: 11, color: GRAPHITE, marginTop: 4, textAlign: 'center' },
  bar: { width: 120, height: 6, backgroundColor: SIGNAL, marginVertical: 26 },
  award: { fontFamily: DISPLAY, fontWeight: 700, fontSize: 60, lineHeight: 1.1, textAlign: 'center' },
  cls: { fontFamily: DISPLAY, fontWeight: 500, fontSize: 22, textAlign: 'center', marginTop: 6 },
  shared: { fontSize: 11, color: GRAPHITE, marginTop: 6 },
  middle: { alignItems: 'center' },
  to: { fontSize: 11, letterSpacing: 2, color: GRAPHITE, marginTop: 30 },
  title: { fontFamily: DISPLAY, fontWeight: 600, fontSize: 30, lineHeight: 1.15, textAlign: 'center', marginTop: 8 },
  owner: { fontSize: 14, lineHeight: 1.3, textAlign: 'center', marginTop: 8 },
  number: { fontFamily: DISPLAY, fontWeight: 500, fontSize: 16, marginTop: 6 },
  bottom: { flexDirection: 'row', alignSelf: 'stretch', justifyContent: 'space-between', alignItems: 'flex-end' },
  sign: { width: 180, borderTopWidth: 0.75, borderTopColor: INK, paddingTop: 4, fontSize: 9, color: GRAPHITE },
  total: { alignItems: 'flex-end' },
  totalLabel: { fontSize: 8, letterSpacing: 1.5, color: GRAPHITE },
  totalFigure: { fontFamily: DISPLAY, fontWeight: 600, fontSize: 22, borderBottomWidth: 0.75, borderBottomColor: RULE },
});

function Certificate({ cert, paper }: { cert: CertificateContent; paper: PrintPaper }) {
  return (
    <Page size={pageSize(paper)} style={c.page}>
      <View style={c.frame}>
        <View style={c.inner}>
          <View style={c.top}>
            <Text style={c.brand}>PLACARD · AWARD</Text>
            <Text style={c.show}>{caps(cert.show.name)}</Text>
            <Text style={c.meta}>
              {cert.show.when} · {cert.show.venue}
            </Text>
          </View>
          <View style={c.middle}>
            <View style={c.bar} />
            <Text style={c.award}>{caps(cert.award)}</Text>
            {cert.className ? <Text style={c.cls}>{caps(cert.className)}</Text> : null}
            {cert.shared ? <Text style={c.shared}>{cert.totalLabel === 'JUDGED TOTAL' ? 'A shared place: the judges’ scores could not separate the cars.' : 'Shared: the visitors gave these cars the same number of votes.'}</Text> : null}
            <Text style={c.to}>AWARDED TO</Text>
            <Text style={c.title}>{cert.title}</Text>
            {cert.owner ? <Text style={c.owner}>{cert.owner}</Text> : null}
            <Text style={c.number}>Number {cert.number}</Text>
          </View>
          <View style={c.bottom}>
            <Text style={c.sign}>For the organisers</Text>
            <View style={c.total}>
              <Text style={c.totalLabel}>{cert.totalLabel}</Text>
              <Text style={c.totalFigure}>{cert.total}</Text>
            </View>
          </View>
        </View>
      </View>
    </Page>
  );
}

/** Award certificates, one page each, in one document ready to print. */
export function CertificatesDocument({ certificates, paper, title }: { certificates: CertificateContent[]; paper: PrintPaper; title: string }) {
  return (
    <Document title={title} author="Placard" creator="Placard">
      {certificates.map((cert, i) => (
        <Certificate key={i} cert={cert} paper={paper} />
      ))}
    </Document>
  );
}
