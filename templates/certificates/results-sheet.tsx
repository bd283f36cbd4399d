import { Document, Page, Text, View } from '@react-pdf/renderer';
import type { PrintPaper } from '@shared/schemas/results';
import type { PrintLine, ResultsSheetContent } from './content';
import { caps, pageSize, s } from './style';

function Table({ lines }: { lines: PrintLine[] }) {
  return (
    <View>
      <View style={s.head} fixed={false}>
        <Text style={[s.headText, s.cPlace]}>PLACE</Text>
        <Text style={[s.headText, s.cNumber]}>NO.</Text>
        <Text style={[s.headText, s.cTitle]}>CAR AND OWNER</Text>
        <Text style={[s.headText, s.cTotal]}>TOTAL</Text>
        <Text style={[s.headText, s.cNote]}>DECIDED BY</Text>
      </View>
      {lines.map((l) => (
        <View key={`${l.place}-${l.number}`} style={s.row} wrap={false}>
          <Text style={[s.figure, s.cPlace]}>{l.place}</Text>
          <Text style={[s.figure, s.cNumber]}>{l.number}</Text>
          <View style={s.cTitle}>
            <Text>{l.title}</Text>
            {l.owner ? <Text style={s.owner}>{l.owner}</Text> : null}
          </View>
          <Text style={[s.figure, s.cTotal]}>{l.total}</Text>
          <Text style={s.cNote}>{l.note}</Text>
        </View>
      ))}
    </View>
  );
}

/** The results of a show by class, for the notice board and the record: one document, as many pages as it takes. */
export function ResultsSheetDocument({ content, paper }: { content: ResultsSheetContent; paper: PrintPaper }) {
  const c = content;
  return (
    <Document title={`Results: ${c.show.name}`} author="Placard" creator="Placard">
      <Page size={pageSize(paper)} style={s.page}>
        <Text style={s.brand}>PLACARD · RESULTS</Text>
        <Text style={s.showName}>{caps(c.show.name)}</Text>
        <Text style={s.meta}>
          {c.show.when} · {c.show.venue}
        </Text>
        <View style={s.rule} />
        {c.bestOfShow.length ? (
          <View wrap={false}>
            <Text style={s.h2}>BEST OF SHOW</Text>
            <Table lines={c.bestOfShow} />
          </View>
        ) : null}
        {c.classes.map((cls) => (
          <View key={cls.name}>
            <Text style={s.h2} minPresenceAhead={60}>
              {caps(cls.name)}
            </Text>
            {cls.placings.length ? <Table lines={cls.placings} /> : <Text style={s.muted}>{cls.none}</Text>}
          </View>
        ))}
        {c.peoplesChoice.length ? (
          <View wrap={false}>
            <Text style={s.h2}>PEOPLE’S CHOICE</Text>
            <Table lines={c.peoplesChoice} />
          </View>
        ) : null}
        <Text style={[s.meta, { marginTop: 14 }]}>{c.rulesNote}</Text>
        <View style={s.footer} fixed>
          <Text>
            {c.show.name} · published {c.publishedOn}
          </Text>
          <Text render={({ pageNumber, totalPages }) => `Page ${pageNumber} of ${totalPages}`} />
        </View>
      </Page>
    </Document>
  );
}
