import { fireEvent, render, screen, waitFor } from '@testing-library/react-native';
import { NewJobForm } from '@/components/jobs/new-job-form';
import type { ModelSummaryDto } from '@/lib/contracts/library';

const MODELS: ModelSummaryDto[] = [
  {
    id: 4,
    make: { id: 1, name: 'Testmake' },
    name: 'Alpha 500',
    yearFrom: 2010,
    yearTo: 2014,
    variant: '',
    componentCount: 3,
    specCount: 9,
  },
];

describe('NewJobForm', () => {
  it('with "a model in the library" and none picked, asks for the model and does not submit', async () => {
    const onSubmit = jest.fn();
    render(<NewJobForm models={MODELS} onSubmit={onSubmit} />);

    fireEvent.press(screen.getByRole('button', { name: 'Create the job' }));

    expect(await screen.findByText('Pick the model, or choose “Not in the library”.')).toBeTruthy();
    expect(onSubmit).not.toHaveBeenCalled();
  });

  it('a machine not in the library needs its description (the request’s own rule)', async () => {
    const onSubmit = jest.fn();
    render(<NewJobForm models={MODELS} onSubmit={onSubmit} />);

    fireEvent.press(screen.getByRole('radio', { name: 'The machine: Not in the library' }));
    fireEvent.press(screen.getByRole('button', { name: 'Create the job' }));

    expect(await screen.findByText('Pick a model from the library or describe the machine.')).toBeTruthy();
    expect(onSubmit).not.toHaveBeenCalled();
  });

  it('sends the picked model and the trimmed fields, leaving out blank ones', async () => {
    const onSubmit = jest.fn();
    render(<NewJobForm models={MODELS} onSubmit={onSubmit} />);

    fireEvent.press(screen.getByRole('radio', { name: /^Model: / }));
    fireEvent.changeText(screen.getByLabelText('VIN or frame number'), ' ZKM-1 ');
    fireEvent.press(screen.getByRole('button', { name: 'Create the job' }));

    await waitFor(() => expect(onSubmit).toHaveBeenCalledWith({ modelId: 4, machineId: 'ZKM-1' }));
  });

  it('shows a server message under the field it names', async () => {
    render(
      <NewJobForm
        models={MODELS}
        onSubmit={jest.fn()}
        failure={{ message: 'Check the fields marked below.', fields: { customerRef: 'At most 80 characters' } }}
      />,
    );

    expect(screen.getByText('Check the fields marked below.')).toBeTruthy();
    expect(await screen.findByText('At most 80 characters')).toBeTruthy();
  });
});
